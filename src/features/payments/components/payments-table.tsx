import { ScrollRegion } from '@/components/ui/scroll-region';
import { useState } from 'react';
import { Link } from 'react-router';
import {
  paymentKindLabels,
  paymentListStateLabels,
  paymentListStates,
  paymentMethodLabels,
  type PaymentListState,
} from '@shared/contracts/payments';
import { formatDay } from '@shared/format/dates';
import { formatCents } from '@shared/money/money';
import { sharedPaths } from '@shared/paths';
import { ErrorNotice, Loading } from '@/components/ui/notice';
import { paymentsCsvHref, usePayments } from '../api/get-payments';

const stateWords = { paid: 'Paid', outstanding: 'Outstanding', refunded: 'Refunded' } as const;

/** Every payment and amount due, filtered by state, with the same list as a CSV file for the bookkeeper. */
export function PaymentsTable() {
  const [state, setState] = useState<PaymentListState>('all');
  const { data, error, isPending } = usePayments(state);
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <nav aria-label="Show" className="flex flex-wrap gap-1">
          {paymentListStates.map((s) => (
            <button
              key={s}
              type="button"
              aria-pressed={state === s}
              onClick={() => setState(s)}
              className={`rounded-md px-3 py-1.5 text-sm font-semibold ${state === s ? 'bg-pine-700 text-white' : 'bg-white text-pine-800 ring-1 ring-pine-200 hover:bg-pine-50'}`}
            >
              {paymentListStateLabels[s]}
            </button>
          ))}
        </nav>
        <a
          href={paymentsCsvHref(state)}
          download
          className="rounded-md border border-pine-200 bg-white px-3 py-1.5 text-sm font-semibold text-pine-800 hover:bg-pine-50"
        >
          Download CSV for the bookkeeper
        </a>
      </div>
      {isPending && <Loading />}
      {error && <ErrorNotice error={error} />}
      {data && (
        <>
          <dl className="grid gap-3 sm:grid-cols-3">
            {[
              ['Paid', data.totals.paidCents],
              ['Outstanding', data.totals.outstandingCents],
              ['Refunded', data.totals.refundedCents],
            ].map(([label, cents]) => (
              <div key={label} className="rounded-md border border-stone-200 bg-white p-3">
                <dt className="text-xs font-semibold uppercase tracking-wide text-stone-600">{label}</dt>
                <dd className="font-mono text-lg text-pine-900">{formatCents(Number(cents))}</dd>
              </div>
            ))}
          </dl>
          {data.rows.length === 0 ? (
            <p className="text-sm text-stone-600">Nothing to show here.</p>
          ) : (
            <ScrollRegion label="Payments">
              <table className="w-full text-left text-sm">
                <thead className="border-b border-stone-200 text-xs uppercase text-stone-600">
                  <tr>
                    <th className="py-2 pr-3">Request</th>
                    <th className="py-2 pr-3">Owner</th>
                    <th className="py-2 pr-3">Payment</th>
                    <th className="py-2 pr-3">State</th>
                    <th className="py-2 pr-3">Paid how</th>
                    <th className="py-2 pr-3 text-right">Amount</th>
                    <th className="py-2 pr-3">Date</th>
                    <th className="py-2">Note</th>
                  </tr>
                </thead>
                <tbody className="divide-y divide-stone-100">
                  {data.rows.map((r) => (
                    <tr key={`${r.requestId}-${r.kind}-${r.state}`}>
                      <td className="py-2 pr-3 font-mono">
                        <Link
                          className="text-pine-700 hover:underline"
                          to={sharedPaths.officeRequest.getHref(r.requestId)}
                        >
                          {r.reference}
                        </Link>
                      </td>
                      <td className="py-2 pr-3">{r.applicantName}</td>
                      <td className="py-2 pr-3">{paymentKindLabels[r.kind]}</td>
                      <td className="py-2 pr-3">{stateWords[r.state]}</td>
                      <td className="py-2 pr-3">{r.method ? paymentMethodLabels[r.method] : '—'}</td>
                      <td className="py-2 pr-3 text-right font-mono">{formatCents(r.amountCents)}</td>
                      <td className="py-2 pr-3">
                        {r.state === 'refunded' ? formatDay(r.refundedAt) : r.date ? formatDay(r.date) : '—'}
                      </td>
                      <td className="py-2">{r.note}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </ScrollRegion>
          )}
        </>
      )}
    </div>
  );
}
