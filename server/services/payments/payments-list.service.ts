import { and, asc, eq } from 'drizzle-orm';
import {
  paymentKindLabels,
  paymentMethodLabels,
  type PaymentListAnswer,
  type PaymentListState,
  type PaymentRowView,
} from '@shared/contracts/payments';
import { formatDay } from '@shared/format/dates';
import type { DbOrTx } from '../../db/client';
import { quotes, requests } from '../../db/schema';
import { amountDue, loadMoneyState } from './money-state';

/**
 * The office's payments view: every payment made and every amount due now, newest first. Outstanding rows are
 * worked out from the same rules the owner's page uses, so the two never disagree.
 */
export async function listPayments(
  ctx: { db: DbOrTx; env: { PAYMENT_CURRENCY: string } },
  state: PaymentListState,
): Promise<PaymentListAnswer<Date>> {
  const withQuotes = await ctx.db
    .selectDistinct({
      id: requests.id,
      reference: requests.reference,
      applicantName: requests.applicantName,
      siteAddress: requests.siteAddress,
      status: requests.status,
    })
    .from(requests)
    .innerJoin(quotes, and(eq(quotes.requestId, requests.id), eq(quotes.status, 'accepted')))
    .orderBy(asc(requests.reference));
  const rows: PaymentRowView<Date>[] = [];
  for (const request of withQuotes) {
    const money = await loadMoneyState(ctx.db, request.id);
    const base = {
      requestId: request.id,
      reference: request.reference,
      applicantName: request.applicantName,
      siteAddress: request.siteAddress,
    };
    for (const p of money.payments) {
      rows.push({
        ...base,
        kind: p.kind,
        state: p.refundedAt ? 'refunded' : 'paid',
        method: p.method,
        amountCents: p.amountCents,
        date: p.paidAt,
        refundedAt: p.refundedAt,
        refundedCents: p.refundedCents,
        note: [p.note, p.refundNote].filter(Boolean).join(' · '),
        paymentId: p.id,
      });
    }
    const { due } = amountDue(money, request.status);
    if (due) {
      rows.push({
        ...base,
        kind: due.kind,
        state: 'outstanding',
        method: null,
        amountCents: due.amountCents,
        date: due.kind === 'deposit' ? (money.quote?.acceptedAt ?? null) : null,
        refundedAt: null,
        refundedCents: 0,
        note: '',
        paymentId: null,
      });
    }
  }
  const shown = state === 'all' ? rows : rows.filter((r) => r.state === state);
  shown.sort((a, b) => (b.date?.getTime() ?? 0) - (a.date?.getTime() ?? 0) || a.reference.localeCompare(b.reference));
  const sum = (s: PaymentRowView['state']) =>
    rows
      .filter((r) => r.state === s)
      .reduce((total, r) => total + (s === 'refunded' ? r.refundedCents : r.amountCents), 0);
  return {
    currency: ctx.env.PAYMENT_CURRENCY,
    rows: shown,
    totals: { paidCents: sum('paid'), outstandingCents: sum('outstanding'), refundedCents: sum('refunded') },
  };
}

/** One CSV field: quoted when it holds a comma, quote or line break (RFC 4180), and kept from being read as a formula. */
export function csvField(value: string): string {
  const safe = /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
  return /[",\r\n]/.test(safe) ? `"${safe.replaceAll('"', '""')}"` : safe;
}

/** Cents as dollars for a spreadsheet: "1234.50", a minus sign for money going back, no currency sign. */
export function centsAsDollars(cents: number): string {
  const sign = cents < 0 ? '-' : '';
  const abs = Math.abs(cents);
  return `${sign}${Math.floor(abs / 100)}.${String(abs % 100).padStart(2, '0')}`;
}

const stateWords: Record<PaymentRowView['state'], string> = {
  paid: 'Paid',
  outstanding: 'Outstanding',
  refunded: 'Refunded',
};

/** The bookkeeper's file: one line per payment or amount due, with a header row. */
export function paymentsCsv(answer: PaymentListAnswer<Date>): string {
  const header = [
    'Request',
    'Owner',
    'Site address',
    'Payment',
    'State',
    'Paid how',
    `Amount (${answer.currency.toUpperCase()})`,
    'Date',
    `Refunded (${answer.currency.toUpperCase()})`,
    'Refunded on',
    'Note',
    'Receipt number',
  ];
  const lines = answer.rows.map((r) =>
    [
      r.reference,
      r.applicantName,
      r.siteAddress,
      paymentKindLabels[r.kind],
      stateWords[r.state],
      r.method ? paymentMethodLabels[r.method] : '',
      centsAsDollars(r.amountCents),
      r.date && r.state !== 'outstanding' ? formatDay(r.date) : '',
      r.refundedCents ? centsAsDollars(r.refundedCents) : '',
      r.refundedAt ? formatDay(r.refundedAt) : '',
      r.note,
      r.paymentId ?? '',
    ].map(csvField),
  );
  return [header.map(csvField), ...lines].map((fields) => fields.join(',')).join('\r\n') + '\r\n';
}
