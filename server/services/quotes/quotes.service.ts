import { and, desc, eq, inArray, ne } from 'drizzle-orm';
import type { z } from 'zod';
import {
  nameKey,
  todayIso,
  type QuoteLine,
  type QuoteLineView,
  type QuoteView,
  type updateQuoteInputSchema,
} from '@shared/contracts/quotes';
import { formatCents as formatMoney, lineAmountCents, quoteTotals } from '@shared/money/money';
import { formatDay } from '@shared/format/dates';
import { isOfficeRole } from '@shared/workflow/statuses';
import type { RequestStatus } from '@shared/workflow/statuses';
import type { RuleProfile } from '@shared/engine';
import type { SessionUser } from '../../lib/session-user';
import type { AppContext } from '../../config/context';
import type { Db, DbOrTx } from '../../db/client';
import {
  documents,
  gradeChecks,
  quotes,
  rateCardVersions,
  requestEvents,
  ruleProfileVersions,
  users,
} from '../../db/schema';
import { AppError, badRequest, conflict, forbidden, notFound } from '../../lib/errors';
import { enqueueEmails } from '../email/outbox';
import { quoteAnsweredEmail, quoteSentEmail } from '../email/quote-emails';
import { loadGradeCheck } from '../grade-checks/grade-checks.service';
import { currentRateCard, pricesOf } from '../rate-cards/rate-cards.service';
import { buildQuotePdf } from '../reports/quote-pdf';
import { storeReport } from '../reports/report-storage';
import { loadVisibleRequest, type RequestRow } from '../requests/request-access';
import { linesFromCheck } from './lines-from-check';

export type QuoteRow = typeof quotes.$inferSelect;

/** A quote is made, sent and answered while the request is alive; not on a draft nor once it has ended. */
const closedStatuses: readonly RequestStatus[] = ['draft', 'closed', 'declined', 'withdrawn'];
const QUOTE_VALID_DAYS = 30;
export const DEFAULT_TERMS =
  'Prices hold until the date above. Work in the road right-of-way waits for the permit. Rock, buried debris or ' +
  'soft ground found while digging, and any change the owner asks for, are priced and agreed in writing before that ' +
  'work is done. The deposit is due on acceptance; the balance when the entrance is built.';

const addDays = (iso: string, days: number) => {
  const d = new Date(`${iso}T12:00:00Z`);
  d.setUTCDate(d.getUTCDate() + days);
  return d.toISOString().slice(0, 10);
};

export function pricedLines(lines: readonly QuoteLine[]): QuoteLineView[] {
  return lines.map((l) => ({ ...l, amountCents: lineAmountCents(l.quantity, l.unitPriceCents) }));
}

function totalsColumns(lines: readonly QuoteLine[], taxRateBp: number, depositRateBp: number) {
  const t = quoteTotals(lines, taxRateBp, depositRateBp);
  return {
    lines: pricedLines(lines),
    subtotalCents: t.subtotalCents,
    taxCents: t.taxCents,
    totalCents: t.totalCents,
    depositCents: t.depositCents,
  };
}

/** The newest version the owner has been sent (sent, accepted or declined); replaced and drafts never are. */
const isCurrentCandidate = (row: QuoteRow) =>
  row.status === 'sent' || row.status === 'accepted' || row.status === 'declined';

interface ViewExtras {
  checkNumbers: Map<string, number>;
  cardVersions: Map<string, number>;
  currentId: string | null;
}

function toView(row: QuoteRow, extras: ViewExtras): QuoteView<Date> {
  return {
    id: row.id,
    requestId: row.requestId,
    version: row.version,
    status: row.status,
    gradeCheckId: row.gradeCheckId,
    gradeCheckNumber: extras.checkNumbers.get(row.gradeCheckId) ?? 0,
    rateCardVersionId: row.rateCardVersionId,
    rateCardVersion: extras.cardVersions.get(row.rateCardVersionId) ?? 0,
    lines: row.lines as QuoteLineView[],
    subtotalCents: row.subtotalCents,
    taxCents: row.taxCents,
    totalCents: row.totalCents,
    taxRateBp: row.taxRateBp,
    depositRateBp: row.depositRateBp,
    depositCents: row.depositCents,
    terms: row.terms,
    validUntil: row.validUntil,
    createdAt: row.createdAt,
    updatedAt: row.updatedAt,
    sentAt: row.sentAt,
    acceptedAt: row.acceptedAt,
    acceptedName: row.acceptedName,
    declinedAt: row.declinedAt,
    declineReason: row.declineReason,
    documentId: row.documentId,
    current: row.id === extras.currentId,
  };
}

async function viewsOf(db: DbOrTx, rows: QuoteRow[]): Promise<QuoteView<Date>[]> {
  if (rows.length === 0) return [];
  const checks = await db
    .select({ id: gradeChecks.id, number: gradeChecks.number })
    .from(gradeChecks)
    .where(inArray(gradeChecks.id, [...new Set(rows.map((r) => r.gradeCheckId))]));
  const cards = await db
    .select({ id: rateCardVersions.id, version: rateCardVersions.version })
    .from(rateCardVersions)
    .where(inArray(rateCardVersions.id, [...new Set(rows.map((r) => r.rateCardVersionId))]));
  const sorted = [...rows].sort((a, b) => b.version - a.version);
  const extras: ViewExtras = {
    checkNumbers: new Map(checks.map((c) => [c.id, c.number])),
    cardVersions: new Map(cards.map((c) => [c.id, c.version])),
    currentId: sorted.find(isCurrentCandidate)?.id ?? null,
  };
  return sorted.map((r) => toView(r, extras));
}

async function requestQuotes(db: DbOrTx, requestId: string) {
  return db.select().from(quotes).where(eq(quotes.requestId, requestId)).orderBy(desc(quotes.version));
}

/** Quotes are the business of the owner and the office; a crew (or anyone else) gets 404, as for an unseen request. */
async function loadQuoteRequest(db: DbOrTx, user: SessionUser, requestId: string): Promise<RequestRow> {
  const row = await loadVisibleRequest(db, user, requestId);
  if (!isOfficeRole(user.role) && row.applicantId !== user.id) throw notFound('Request');
  return row;
}

export async function loadVisibleQuote(db: DbOrTx, user: SessionUser, quoteId: string) {
  const [row] = await db.select().from(quotes).where(eq(quotes.id, quoteId));
  if (!row) throw notFound('Quote');
  const request = await loadQuoteRequest(db, user, row.requestId).catch(() => {
    throw notFound('Quote');
  });
  if (!isOfficeRole(user.role) && row.status === 'draft') throw notFound('Quote');
  return { quote: row, request };
}

export async function quoteViewOf(db: DbOrTx, row: QuoteRow): Promise<QuoteView<Date>> {
  const views = await viewsOf(db, await requestQuotes(db, row.requestId));
  return views.find((v) => v.id === row.id)!;
}

/** The request's quotes, newest first; the owner sees what was sent, the office also its drafts and the newest check. */
export async function listQuotes(db: Db, user: SessionUser, requestId: string) {
  await loadQuoteRequest(db, user, requestId);
  const office = isOfficeRole(user.role);
  const rows = await requestQuotes(db, requestId);
  const views = await viewsOf(db, office ? rows : rows.filter((r) => r.status !== 'draft'));
  if (!office) return { quotes: views };
  const [latest] = await db
    .select({ id: gradeChecks.id, number: gradeChecks.number })
    .from(gradeChecks)
    .where(eq(gradeChecks.requestId, requestId))
    .orderBy(desc(gradeChecks.number))
    .limit(1);
  return { quotes: views, latestCheck: latest ?? null, rateCardPublished: (await currentRateCard(db)) !== null };
}

function assertOpen(request: RequestRow) {
  if (closedStatuses.includes(request.status))
    throw conflict(
      request.status === 'draft'
        ? 'The request has not been sent to the office yet; a quote follows the site visit.'
        : 'The request has ended (closed, declined or withdrawn); its quotes can no longer change.',
    );
}

async function assertNoneAccepted(db: DbOrTx, requestId: string) {
  const [accepted] = await db
    .select({ version: quotes.version })
    .from(quotes)
    .where(and(eq(quotes.requestId, requestId), eq(quotes.status, 'accepted')));
  if (accepted)
    throw conflict(
      `The owner accepted version ${accepted.version}; an accepted quote stands, so no revision can be sent.`,
    );
}

async function landingLengthOf(db: DbOrTx, ruleProfileVersionId: string): Promise<number> {
  const [row] = await db
    .select({ profile: ruleProfileVersions.profile })
    .from(ruleProfileVersions)
    .where(eq(ruleProfileVersions.id, ruleProfileVersionId));
  return (row?.profile as RuleProfile | undefined)?.landing?.lengthFt ?? 0;
}

/**
 * A new draft version, its lines made from a saved check's quantities and the current rate card. A revision is made
 * the same way from a newer check (or the same one); the sent versions stay as they were.
 */
export async function createQuote(db: Db, user: SessionUser, requestId: string, input: { gradeCheckId: string }) {
  const request = await loadQuoteRequest(db, user, requestId);
  assertOpen(request);
  const check = await loadGradeCheck(db, input.gradeCheckId).catch(() => null);
  if (!check || check.requestId !== request.id)
    throw badRequest('Grade check: choose one of this request’s saved checks.', {
      gradeCheckId: 'Grade check must be one of this request’s saved checks',
    });
  const card = await currentRateCard(db);
  if (!card) throw conflict('No rate card is published yet: the admin sets the prices first.');
  const prices = pricesOf(card);
  const lines = linesFromCheck(
    {
      number: check.number,
      record: { formatVersion: 2, inputs: check.inputs, results: check.results },
      landingLengthFt: await landingLengthOf(db, check.ruleProfileVersionId),
    },
    prices,
  );
  return db.transaction(async (tx) => {
    await loadVisibleRequest(tx, user, requestId, { forUpdate: true });
    await assertNoneAccepted(tx, requestId);
    const existing = await requestQuotes(tx, requestId);
    const draft = existing.find((q) => q.status === 'draft');
    if (draft)
      throw conflict(
        `Version ${draft.version} is still a draft: edit and send it, or discard it, before starting another.`,
      );
    const version = (existing[0]?.version ?? 0) + 1;
    const [row] = await tx
      .insert(quotes)
      .values({
        requestId,
        version,
        status: 'draft',
        gradeCheckId: check.id,
        rateCardVersionId: card.id,
        ...totalsColumns(lines, prices.salesTaxBp, prices.depositBp),
        taxRateBp: prices.salesTaxBp,
        depositRateBp: prices.depositBp,
        terms: existing[0]?.terms ?? DEFAULT_TERMS,
        validUntil: addDays(todayIso(), QUOTE_VALID_DAYS),
        createdById: user.id,
      })
      .returning();
    await tx.insert(requestEvents).values({
      requestId,
      actorId: user.id,
      kind: 'quote-drafted',
      internal: true,
      note: `Quote version ${version} drafted from grade check ${check.number} and rate card version ${card.version}.`,
    });
    return row;
  });
}

async function loadOfficeDraft(tx: DbOrTx, user: SessionUser, quoteId: string) {
  const { quote } = await loadVisibleQuote(tx, user, quoteId);
  const [row] = await tx.select().from(quotes).where(eq(quotes.id, quote.id)).for('update');
  if (row.status !== 'draft')
    throw conflict(`Version ${row.version} was sent and can no longer change; start a revision instead.`);
  return row;
}

/** The office's edits to a draft: the lines, terms and validity; the totals are worked out again here. */
export async function updateQuote(
  db: Db,
  user: SessionUser,
  quoteId: string,
  input: z.output<typeof updateQuoteInputSchema>,
) {
  return db.transaction(async (tx) => {
    const row = await loadOfficeDraft(tx, user, quoteId);
    const [saved] = await tx
      .update(quotes)
      .set({
        ...totalsColumns(input.lines, row.taxRateBp, row.depositRateBp),
        terms: input.terms,
        validUntil: input.validUntil,
        updatedAt: new Date(),
      })
      .where(eq(quotes.id, row.id))
      .returning();
    return saved;
  });
}

export async function discardDraft(db: Db, user: SessionUser, quoteId: string) {
  await db.transaction(async (tx) => {
    const row = await loadOfficeDraft(tx, user, quoteId);
    await tx.delete(quotes).where(eq(quotes.id, row.id));
  });
}

async function pdfData(db: DbOrTx, row: QuoteRow, request: RequestRow, preview: boolean) {
  const view = await quoteViewOf(db, row);
  return buildQuotePdf({
    request,
    quote: { ...view, sentAt: row.sentAt },
    checkNumber: view.gradeCheckNumber,
    rateCardVersion: view.rateCardVersion,
    preview,
  });
}

/** A sent version's PDF, made from the stored quote alone (the demo seed stores its quotes' PDFs with it). */
export const sentQuotePdf = (db: DbOrTx, row: QuoteRow, request: RequestRow) => pdfData(db, row, request, false);

/** The PDF as it would be sent (a draft says "preview" across its top). */
export async function quotePdf(db: Db, user: SessionUser, quoteId: string) {
  const { quote, request } = await loadVisibleQuote(db, user, quoteId);
  return { pdf: await pdfData(db, quote, request, quote.status === 'draft'), quote, request };
}

/**
 * Sends a draft: its PDF is stored and shared with the owner as a document of the request, the version is frozen,
 * the one it follows is marked replaced, and the owner is e-mailed. A sent quote never changes again.
 */
export async function sendQuote(ctx: Pick<AppContext, 'db' | 's3' | 'env'>, user: SessionUser, quoteId: string) {
  const { quote, request } = await loadVisibleQuote(ctx.db, user, quoteId);
  if (quote.status !== 'draft') throw conflict(`Version ${quote.version} was already sent; a change is a new version.`);
  assertOpen(request);
  if (quote.validUntil < todayIso())
    throw badRequest('Valid until is in the past: set a date from today on before sending.', {
      validUntil: 'Valid until must be today or later',
    });
  await assertNoneAccepted(ctx.db, request.id);
  const sentAt = new Date();
  const pdf = await pdfData(ctx.db, { ...quote, sentAt }, request, false);
  const objectKey = `quotes/${request.id}/quote-${quote.version}-${quote.id}.pdf`;
  // Stored before the transaction: no transaction waits on storage, and a send that fails later leaves only an
  // object nobody links to, written again under the same key by the next try.
  try {
    await storeReport(ctx, objectKey, pdf);
  } catch {
    throw new AppError(
      503,
      'storage_unavailable',
      'The quote’s PDF could not be stored just now, so nothing was sent. Try again in a minute.',
    );
  }
  return ctx.db.transaction(async (tx) => {
    await loadVisibleRequest(tx, user, request.id, { forUpdate: true });
    const [row] = await tx.select().from(quotes).where(eq(quotes.id, quote.id)).for('update');
    if (!row || row.status !== 'draft')
      throw conflict(`Version ${quote.version} was already sent; a change is a new version.`);
    await assertNoneAccepted(tx, request.id);
    const [document] = await tx
      .insert(documents)
      .values({
        requestId: request.id,
        gradeCheckId: row.gradeCheckId,
        kind: 'quote',
        title: `Quote version ${row.version}`,
        objectKey,
        contentType: 'application/pdf',
        sizeBytes: pdf.length,
        sharedWithApplicant: true,
        createdById: user.id,
      })
      .returning();
    const replaced = await tx
      .update(quotes)
      .set({ status: 'replaced', updatedAt: sentAt })
      .where(and(eq(quotes.requestId, request.id), inArray(quotes.status, ['sent', 'declined']), ne(quotes.id, row.id)))
      .returning({ version: quotes.version });
    const [saved] = await tx
      .update(quotes)
      .set({ status: 'sent', sentAt, sentById: user.id, documentId: document.id, updatedAt: sentAt })
      .where(eq(quotes.id, row.id))
      .returning();
    const replacedVersion = replaced.length > 0 ? Math.max(...replaced.map((r) => r.version)) : null;
    const [event] = await tx
      .insert(requestEvents)
      .values({
        requestId: request.id,
        actorId: user.id,
        kind: 'quote-sent',
        note: `Quote version ${saved.version} sent: total ${formatMoney(saved.totalCents)}, deposit ${formatMoney(saved.depositCents)}.${replacedVersion === null ? '' : ` It replaces version ${replacedVersion}.`}`,
      })
      .returning({ id: requestEvents.id });
    const [owner] = await tx
      .select({ email: users.email, name: users.name })
      .from(users)
      .where(eq(users.id, request.applicantId));
    await enqueueEmails(tx, [
      {
        ...quoteSentEmail({
          request,
          owner,
          quote: { ...saved, lines: saved.lines as QuoteLineView[] },
          replacedVersion,
          appOrigin: ctx.env.APP_ORIGIN,
          pdf,
        }),
        eventId: event.id,
      },
    ]);
    return saved;
  });
}

/** Only the request's owner answers a quote; the office and crews are refused in plain words. */
async function loadOwnersCurrentQuote(tx: DbOrTx, user: SessionUser, quoteId: string) {
  const { quote, request } = await loadVisibleQuote(tx, user, quoteId);
  if (request.applicantId !== user.id)
    throw forbidden('Only the homeowner who made the request can accept or decline its quote.');
  // The request's row first, as sending does: an answer and a revision being sent take turns, so a version cannot be
  // accepted while a later one goes out over it.
  await loadVisibleRequest(tx, user, request.id, { forUpdate: true });
  const [row] = await tx.select().from(quotes).where(eq(quotes.id, quote.id)).for('update');
  if (row.status === 'replaced')
    throw conflict(`Version ${row.version} was replaced by a later version: read and answer the current one.`);
  if (row.status === 'accepted') throw conflict(`You already accepted version ${row.version}.`);
  if (row.status === 'declined') throw conflict(`You already declined version ${row.version}.`);
  if (row.validUntil < todayIso())
    throw conflict(
      `Version ${row.version} was valid until ${formatDay(row.validUntil)}; ask the office in the messages for a new one.`,
    );
  assertOpen(request);
  return { row, request };
}

async function answer(
  ctx: Pick<AppContext, 'db' | 'env'>,
  user: SessionUser,
  row: QuoteRow,
  request: RequestRow,
  saved: QuoteRow,
  tx: DbOrTx,
  given: { kind: 'accepted'; name: string } | { kind: 'declined'; reason: string },
) {
  const [event] = await tx
    .insert(requestEvents)
    .values({
      requestId: request.id,
      actorId: user.id,
      kind: given.kind === 'accepted' ? 'quote-accepted' : 'quote-declined',
      note:
        given.kind === 'accepted'
          ? `Quote version ${row.version} accepted by ${user.name}, typing the name “${given.name}”.`
          : `Quote version ${row.version} declined: ${given.reason}`,
    })
    .returning({ id: requestEvents.id });
  await enqueueEmails(tx, [
    {
      ...quoteAnsweredEmail({
        request,
        quote: { ...saved, lines: saved.lines as QuoteLineView[] },
        answer: given,
        ownerName: user.name,
        officeEmail: ctx.env.OFFICE_EMAIL,
        appOrigin: ctx.env.APP_ORIGIN,
      }),
      eventId: event.id,
    },
  ]);
}

/**
 * The owner accepts by typing their name; it must match the name on the request or on their account (case, spacing
 * and punctuation aside), so a stray keystroke is not taken for a signature. Kept with the moment and the version.
 */
export async function acceptQuote(
  ctx: Pick<AppContext, 'db' | 'env'>,
  user: SessionUser,
  quoteId: string,
  input: { name: string },
) {
  return ctx.db.transaction(async (tx) => {
    const { row, request } = await loadOwnersCurrentQuote(tx, user, quoteId);
    const typed = nameKey(input.name);
    const accepted = [request.applicantName, user.name].filter(Boolean).map(nameKey);
    if (!accepted.includes(typed))
      throw badRequest(`Your full name: type ${request.applicantName || user.name} to accept.`, {
        name: `Your full name must match the name on the request (${request.applicantName || user.name})`,
      });
    const [saved] = await tx
      .update(quotes)
      .set({ status: 'accepted', acceptedAt: new Date(), acceptedName: input.name, acceptedById: user.id })
      .where(and(eq(quotes.id, row.id), eq(quotes.status, 'sent')))
      .returning();
    await answer(ctx, user, row, request, saved, tx, { kind: 'accepted', name: input.name });
    return saved;
  });
}

export async function declineQuote(
  ctx: Pick<AppContext, 'db' | 'env'>,
  user: SessionUser,
  quoteId: string,
  input: { reason: string },
) {
  return ctx.db.transaction(async (tx) => {
    const { row, request } = await loadOwnersCurrentQuote(tx, user, quoteId);
    const [saved] = await tx
      .update(quotes)
      .set({ status: 'declined', declinedAt: new Date(), declineReason: input.reason, declinedById: user.id })
      .where(and(eq(quotes.id, row.id), eq(quotes.status, 'sent')))
      .returning();
    await answer(ctx, user, row, request, saved, tx, { kind: 'declined', reason: input.reason });
    return saved;
  });
}
