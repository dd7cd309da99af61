import { ScrollRegion } from '@/components/ui/scroll-region';
import type { QuoteView } from '@shared/contracts/quotes';
import { formatBasisPoints, formatCents } from '@shared/money/money';
import { quantityWithUnit } from '@shared/format/counts';

/** A quote's lines and totals, read only: what the owner reads and what a sent version shows the office. */
export function QuoteLinesTable({ quote, showSources = true }: { quote: QuoteView; showSources?: boolean }) {
  return (
    <ScrollRegion label={`Quote version ${quote.version} lines`}>
      <table className="w-full text-left text-sm">
        <caption className="sr-only">Quote version {quote.version} lines</caption>
        <thead>
          <tr className="border-b border-stone-300 text-stone-700">
            <th className="py-1 pr-2">Line</th>
            <th className="pr-2 text-right">Quantity</th>
            <th className="pr-2 text-right">Unit price</th>
            <th className="text-right">Amount</th>
          </tr>
        </thead>
        <tbody>
          {quote.lines.map((line, i) => (
            <tr key={i} className="border-b border-stone-100 align-top">
              <td className="py-1 pr-2">
                {line.description}
                {line.taxable && <span className="text-stone-600"> (taxed)</span>}
                {showSources && line.source && <span className="block text-xs text-stone-600">{line.source}</span>}
              </td>
              <td className="pr-2 text-right whitespace-nowrap">{quantityWithUnit(line.quantity, line.unit)}</td>
              <td className="pr-2 text-right">{formatCents(line.unitPriceCents)}</td>
              <td className="text-right">{formatCents(line.amountCents)}</td>
            </tr>
          ))}
        </tbody>
        <tfoot className="text-stone-800">
          <tr>
            <td colSpan={3} className="pt-2 pr-2 text-right">
              Subtotal
            </td>
            <td className="pt-2 text-right">{formatCents(quote.subtotalCents)}</td>
          </tr>
          <tr>
            <td colSpan={3} className="pr-2 text-right">
              Sales tax at {formatBasisPoints(quote.taxRateBp)} on the taxed lines
            </td>
            <td className="text-right">{formatCents(quote.taxCents)}</td>
          </tr>
          <tr className="font-bold">
            <td colSpan={3} className="pr-2 text-right">
              Total
            </td>
            <td className="text-right">{formatCents(quote.totalCents)}</td>
          </tr>
          <tr>
            <td colSpan={3} className="pr-2 text-right">
              Deposit on acceptance ({formatBasisPoints(quote.depositRateBp)})
            </td>
            <td className="text-right">{formatCents(quote.depositCents)}</td>
          </tr>
        </tfoot>
      </table>
    </ScrollRegion>
  );
}
