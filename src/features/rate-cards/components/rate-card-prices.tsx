import {
  lineKindLabels,
  pipeMaterialLabels,
  quoteLineKinds,
  rateCardLabels as L,
  type RateCardPrices,
} from '@shared/contracts/rate-cards';
import { formatBasisPoints, formatCents } from '@shared/money/money';

/** A published version's prices, read only. */
export function RateCardPricesView({ prices }: { prices: RateCardPrices }) {
  const rows: [string, string][] = [
    [L.excavationPerBankCyCents, formatCents(prices.excavationPerBankCyCents)],
    [L.fillPerCompactedCyCents, formatCents(prices.fillPerCompactedCyCents)],
    [L.haulPerLoadCents, formatCents(prices.haulPerLoadCents)],
    [
      `Base course, per ${prices.baseCourse.basis === 'ton' ? 'ton' : 'sq ft'}`,
      `${formatCents(prices.baseCourse.priceCents)} (${prices.baseCourse.depthIn} in deep, ${prices.baseCourse.tonsPerCy} tons per cu yd)`,
    ],
    [L.pavingPerSqFtCents, prices.pavingPerSqFtCents === null ? 'not offered' : formatCents(prices.pavingPerSqFtCents)],
    [L.mobilisationCents, formatCents(prices.mobilisationCents)],
    [
      L.trafficControlPerDayCents,
      `${formatCents(prices.trafficControlPerDayCents)} (usually ${prices.trafficControlDays} days)`,
    ],
    [L.permitFeeCents, formatCents(prices.permitFeeCents)],
    [L.salesTaxBp, formatBasisPoints(prices.salesTaxBp)],
    [
      'Lines that carry sales tax',
      quoteLineKinds
        .filter((k) => k !== 'other' && prices.taxable[k])
        .map((k) => lineKindLabels[k])
        .join(', ') || 'none',
    ],
    [L.depositBp, formatBasisPoints(prices.depositBp)],
  ];
  return (
    <div className="space-y-4">
      <dl className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-[auto_1fr]">
        {rows.map(([label, value]) => (
          <div key={label} className="contents">
            <dt className="font-semibold text-stone-700">{label}</dt>
            <dd>{value}</dd>
          </div>
        ))}
      </dl>
      <table className="w-full text-left text-sm">
        <caption className="mb-1 text-left font-semibold text-stone-700">{L.pipes}</caption>
        <thead>
          <tr className="border-b border-stone-200">
            <th className="py-1">Diameter</th>
            <th>Material</th>
            <th className="text-right">Per foot</th>
            <th className="text-right">End section, each</th>
          </tr>
        </thead>
        <tbody>
          {prices.pipes.length === 0 && (
            <tr>
              <td colSpan={4} className="py-1 text-stone-600">
                No pipe sizes priced.
              </td>
            </tr>
          )}
          {prices.pipes.map((p) => (
            <tr key={`${p.diameterIn}-${p.material}`} className="border-b border-stone-100">
              <td className="py-1">{p.diameterIn} in</td>
              <td>{pipeMaterialLabels[p.material]}</td>
              <td className="text-right">{formatCents(p.perFootCents)}</td>
              <td className="text-right">{formatCents(p.endSectionEachCents)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
