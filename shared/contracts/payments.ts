import { z } from 'zod';
import type { Moment } from './wire';

/** Where the payment provider sends its signed notices (webhooks). */
export const paymentWebhookPath = '/api/payments/webhook';

export const paymentKinds = ['deposit', 'balance'] as const;
export type PaymentKind = (typeof paymentKinds)[number];
export const paymentKindLabels: Record<PaymentKind, string> = { deposit: 'Deposit', balance: 'Balance' };

export const paymentMethods = ['card', 'offline'] as const;
export type PaymentMethod = (typeof paymentMethods)[number];
export const paymentMethodLabels: Record<PaymentMethod, string> = {
  card: 'Card, online',
  offline: 'Cheque or other, recorded by the office',
};

const kindField = z.enum(paymentKinds, { error: 'Payment: choose the deposit or the balance.' });
const noteField = (label: string, max: number) =>
  z
    .string({ error: `${label}: write it as text.` })
    .trim()
    .max(max, `${label}: keep it under ${max.toLocaleString('en-US')} characters.`);

/**
 * POST /api/requests/:id/payments/checkout: the owner asks for the payment page of what is due. The amount is never
 * sent: the server takes it from the accepted quote and the payments already made.
 */
export const startCheckoutInputSchema = z.strictObject({ kind: kindField });
export type StartCheckoutInput = z.input<typeof startCheckoutInputSchema>;

/** POST /api/requests/:id/payments/return: the owner is back from the payment page with its session id. */
export const checkoutReturnInputSchema = z.strictObject({
  sessionId: z
    .string({ error: 'Payment page: the id is missing.' })
    .trim()
    .min(1, 'Payment page: the id is missing.')
    .max(255, 'Payment page: that id is too long.')
    .regex(/^[A-Za-z0-9_]+$/, 'Payment page: that is not a payment page id.'),
});
export type CheckoutReturnInput = z.input<typeof checkoutReturnInputSchema>;

/** POST /api/requests/:id/payments/offline: the office records a cheque (or cash, or a transfer) it received. */
export const offlinePaymentInputSchema = z.strictObject({
  kind: kindField,
  note: noteField('Note', 500).min(1, 'Note: say how it was paid, such as the cheque number.'),
});
export type OfflinePaymentInput = z.input<typeof offlinePaymentInputSchema>;

/** POST /api/payments/:id/refund (admin). The whole payment is returned. */
export const refundInputSchema = z.strictObject({
  note: noteField('Reason for the refund', 500).min(1, 'Reason for the refund: say why the money goes back.'),
});
export type RefundInput = z.input<typeof refundInputSchema>;

const centsField = (label: string) =>
  z
    .number({ error: `${label}: enter an amount in cents, a whole number.` })
    .int(`${label}: enter whole cents (no fractions of a cent).`)
    .min(-100_000_000, `${label}: a change can take off at most $1,000,000.00.`)
    .max(100_000_000, `${label}: a change can add at most $1,000,000.00.`)
    .refine((v) => v !== 0, `${label}: a change of $0.00 changes nothing.`);

/** POST /api/requests/:id/payments/changes: a change to the price agreed with the owner, added to the balance. */
export const balanceChangeInputSchema = z.strictObject({
  description: noteField('What changed', 300).min(1, 'What changed: describe the agreed change.'),
  amountCents: centsField('Amount'),
});
export type BalanceChangeInput = z.input<typeof balanceChangeInputSchema>;

/** PUT /api/settings/payment-waits (admin): whether filing and closing wait for the money. */
export const paymentWaitsSchema = z.strictObject({
  depositBeforePermit: z.boolean({ error: 'File the permit only once the deposit is paid: choose yes or no.' }),
  balanceBeforeClose: z.boolean({ error: 'Close only once the balance is paid: choose yes or no.' }),
});
export type PaymentWaits = z.infer<typeof paymentWaitsSchema>;
export const paymentWaitLabels: Record<keyof PaymentWaits, string> = {
  depositBeforePermit: 'File the permit only once the deposit is paid',
  balanceBeforeClose: 'Close the request only once the balance is paid',
};

export interface PaymentView<When extends Moment = string> {
  id: string;
  kind: PaymentKind;
  method: PaymentMethod;
  amountCents: number;
  currency: string;
  paidAt: When;
  note: string;
  refundedAt: When | null;
  refundedCents: number;
  refundNote: string;
}

export interface BalanceChangeView<When extends Moment = string> {
  id: string;
  description: string;
  amountCents: number;
  createdAt: When;
}

/** What is owed now, by kind; null when nothing of that kind can be paid yet (with the reason in words). */
export interface AmountDue {
  kind: PaymentKind;
  amountCents: number;
}

/** GET /api/requests/:id/payments: the money side of one request, for the owner and the office. */
export interface RequestPaymentsView<When extends Moment = string> {
  currency: string;
  quote: { quoteId: string; version: number; totalCents: number; depositCents: number } | null;
  changes: BalanceChangeView<When>[];
  /** Quote total plus the agreed changes. */
  agreedTotalCents: number | null;
  payments: PaymentView<When>[];
  due: AmountDue | null;
  /** Why nothing can be paid now, or what comes next, in plain words. */
  dueText: string;
  /** For the office: the step that waits for money under the company's setting, in plain words. */
  waits: { action: 'file-permit' | 'close'; text: string }[];
}

export interface CheckoutAnswer {
  /** The provider's page to send the browser to. */
  url: string;
}

export const paymentListStates = ['all', 'paid', 'outstanding', 'refunded'] as const;
export type PaymentListState = (typeof paymentListStates)[number];
export const paymentListStateLabels: Record<PaymentListState, string> = {
  all: 'Everything',
  paid: 'Paid',
  outstanding: 'Outstanding',
  refunded: 'Refunded',
};
export const paymentListQuerySchema = z.strictObject({
  state: z.enum(paymentListStates, { error: 'Show: choose everything, paid, outstanding or refunded.' }).default('all'),
});

/** One row of the office's payments view: a payment made, or an amount due and not yet paid. */
export interface PaymentRowView<When extends Moment = string> {
  requestId: string;
  reference: string;
  applicantName: string;
  siteAddress: string;
  kind: PaymentKind;
  state: Exclude<PaymentListState, 'all'>;
  method: PaymentMethod | null;
  amountCents: number;
  /** Paid on, or for outstanding rows the day the amount became due. */
  date: When | null;
  refundedAt: When | null;
  refundedCents: number;
  note: string;
  paymentId: string | null;
}

export interface PaymentListAnswer<When extends Moment = string> {
  currency: string;
  rows: PaymentRowView<When>[];
  totals: { paidCents: number; outstandingCents: number; refundedCents: number };
}
