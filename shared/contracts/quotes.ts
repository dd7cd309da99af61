import { z } from 'zod';
import { dayInput } from '../workflow/dates';
import { centsField, measureField, quoteLineKinds, type QuoteLineKind } from './rate-cards';
import type { Moment } from './wire';

export const quoteStatuses = ['draft', 'sent', 'accepted', 'declined', 'replaced'] as const;
export type QuoteStatus = (typeof quoteStatuses)[number];

/** Plain words for each status, as the office and the owner read them. */
export const quoteStatusLabels: Record<QuoteStatus, string> = {
  draft: 'Draft (not sent)',
  sent: 'Sent, waiting for an answer',
  accepted: 'Accepted',
  declined: 'Declined',
  replaced: 'Replaced by a later version',
};

/** Every quote field's on-screen label; the 400's words start with it. */
export const quoteLabels = {
  lines: 'Lines',
  kind: 'Kind',
  description: 'Description',
  quantity: 'Quantity',
  unit: 'Unit',
  unitPriceCents: 'Unit price',
  taxable: 'Taxable',
  source: 'Where the quantity came from',
  terms: 'Terms',
  validUntil: 'Valid until',
  gradeCheckId: 'Grade check',
  name: 'Your full name',
  reason: 'Reason',
} as const;
const L = quoteLabels;

/** The largest quantity one line may carry: past it a survey typo is likelier than a driveway. */
export const MAX_LINE_QUANTITY = 100_000;
export const MAX_LINES = 60;

export const quoteLineSchema = z.strictObject({
  kind: z.enum(quoteLineKinds, { error: `${L.kind} must be one of the rate card's kinds or "other"` }),
  description: z
    .string({ error: `${L.description} must be text` })
    .trim()
    .min(1, `${L.description} is required`)
    .max(200, `${L.description} must be at most 200 characters`),
  quantity: measureField(L.quantity, 0, MAX_LINE_QUANTITY, ''),
  unit: z
    .string({ error: `${L.unit} must be text` })
    .trim()
    .min(1, `${L.unit} is required (for example "cu yd", "ft", "each")`)
    .max(20, `${L.unit} must be at most 20 characters`),
  unitPriceCents: centsField(L.unitPriceCents),
  taxable: z.boolean({ error: `${L.taxable} must be yes or no` }),
  source: z
    .string({ error: `${L.source} must be text` })
    .trim()
    .max(300, `${L.source} must be at most 300 characters`)
    .default(''),
});
export type QuoteLineInput = z.input<typeof quoteLineSchema>;
export type QuoteLine = z.output<typeof quoteLineSchema>;

/** A line as stored and shown: the input plus its amount, quantity x unit price rounded half up to the cent. */
export interface QuoteLineView extends QuoteLine {
  amountCents: number;
}

/** Today as YYYY-MM-DD in UTC; the server's clock decides what "the past" is. */
export const todayIso = () => new Date().toISOString().slice(0, 10);

/** POST /api/requests/:id/quotes: a new draft version priced from a saved check and the current rate card. */
export const createQuoteInputSchema = z.strictObject({
  gradeCheckId: z.uuid(`${L.gradeCheckId} must be one of this request's saved checks`),
});
export type CreateQuoteInput = z.input<typeof createQuoteInputSchema>;

/** PUT /api/quotes/:id: the draft's lines, terms and validity. */
export const updateQuoteInputSchema = z.strictObject({
  lines: z
    .array(quoteLineSchema, { error: `${L.lines} must be a list` })
    .min(1, `${L.lines}: a quote needs at least one line`)
    .max(MAX_LINES, `${L.lines}: at most ${MAX_LINES} lines`),
  terms: z
    .string({ error: `${L.terms} must be text` })
    .trim()
    .max(4000, `${L.terms} must be at most 4,000 characters`),
  validUntil: dayInput(`${L.validUntil} must be a date`).refine(
    (day) => day >= todayIso(),
    `${L.validUntil} must be today or later`,
  ),
});
export type UpdateQuoteInput = z.input<typeof updateQuoteInputSchema>;

/** POST /api/quotes/:id/accept: the owner's typed name. */
export const acceptQuoteInputSchema = z.strictObject({
  name: z
    .string({ error: `${L.name} must be text` })
    .trim()
    .min(1, `${L.name} is required: type your full name to accept`)
    .max(200, `${L.name} must be at most 200 characters`),
});
export type AcceptQuoteInput = z.input<typeof acceptQuoteInputSchema>;

/** POST /api/quotes/:id/decline: why. */
export const declineQuoteInputSchema = z.strictObject({
  reason: z
    .string({ error: `${L.reason} must be text` })
    .trim()
    .min(1, `${L.reason} is required: say why, so the office can answer`)
    .max(2000, `${L.reason} must be at most 2,000 characters`),
});
export type DeclineQuoteInput = z.input<typeof declineQuoteInputSchema>;

/** Normalises a typed name for comparison: case, spacing and punctuation do not matter. */
export const nameKey = (name: string) =>
  name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^\p{L}\p{N}]+/gu, ' ')
    .trim();

export interface QuoteView<When extends Moment = string> {
  id: string;
  requestId: string;
  version: number;
  status: QuoteStatus;
  gradeCheckId: string;
  gradeCheckNumber: number;
  rateCardVersionId: string;
  rateCardVersion: number;
  lines: QuoteLineView[];
  subtotalCents: number;
  taxCents: number;
  totalCents: number;
  taxRateBp: number;
  depositRateBp: number;
  depositCents: number;
  terms: string;
  /** YYYY-MM-DD */
  validUntil: string;
  createdAt: When;
  updatedAt: When;
  sentAt: When | null;
  acceptedAt: When | null;
  acceptedName: string | null;
  declinedAt: When | null;
  declineReason: string | null;
  /** The sent PDF (a document of the request). */
  documentId: string | null;
  /** The version the owner is answering: the newest one sent. */
  current: boolean;
}

export interface QuotesAnswer<When extends Moment = string> {
  /** Newest first. The owner never sees drafts. */
  quotes: QuoteView<When>[];
  /** The office only: the newest saved check, so a check newer than the current quote's offers a revision. */
  latestCheck?: { id: string; number: number } | null;
  /** The office only: whether a rate card is published (a quote needs one). */
  rateCardPublished?: boolean;
}
export interface QuoteAnswer<When extends Moment = string> {
  quote: QuoteView<When>;
}

export type { QuoteLineKind };
