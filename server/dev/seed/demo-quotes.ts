import { and, eq, isNull, ne } from 'drizzle-orm';
import type { AppContext } from '../../config/context';
import type { RuleProfile } from '@shared/engine';
import { readGradeCheckRecord } from '@shared/grade-check/stored-check';
import type { Tx } from '../../db/client';
import { documents, gradeChecks, quotes, requestEvents, requests, ruleProfileVersions, users } from '../../db/schema';
import { linesFromCheck } from '../../services/quotes/lines-from-check';
import { DEFAULT_TERMS, pricedLines, sentQuotePdf } from '../../services/quotes/quotes.service';
import { storeReport } from '../../services/reports/report-storage';
import { pricesOf } from '../../services/rate-cards/rate-cards.service';
import { quoteTotals, formatCents } from '@shared/money/money';
import { seedRateCard } from './demo-rate-card';

const DAY = 86_400_000;
const isoDate = (d: Date) => d.toISOString().slice(0, 10);

/** Two demo requests at the quote's two money stages: one sent and waiting, one accepted. */
const demoQuotes = [
  { address: '2 Quillfeather Road, Elderbrook', answer: null, sentDaysAgo: 2 },
  { address: '904 Old Mill Road, Marrow Crossing', answer: 'accepted', sentDaysAgo: 9 },
] as const;

/**
 * The demo rate card, and a quote for each request above made from its saved check and that card, as the office
 * would have sent it. Skipped per request when it has a quote, so running it again changes nothing.
 */
export async function seedDemoQuotes(tx: Tx, now = Date.now()) {
  const card = await seedRateCard(tx);
  const prices = pricesOf(card);
  const [office] = await tx.select().from(users).where(eq(users.email, 'priya.lindqvist@gradepass.test'));
  if (!office) return;
  for (const demo of demoQuotes) {
    const [request] = await tx.select().from(requests).where(eq(requests.siteAddress, demo.address));
    if (!request) continue;
    const [taken] = await tx.select({ id: quotes.id }).from(quotes).where(eq(quotes.requestId, request.id));
    if (taken) continue;
    const [check] = await tx
      .select()
      .from(gradeChecks)
      .where(and(eq(gradeChecks.requestId, request.id), eq(gradeChecks.number, 1)));
    if (!check) continue;
    const [version] = await tx
      .select({ profile: ruleProfileVersions.profile })
      .from(ruleProfileVersions)
      .where(eq(ruleProfileVersions.id, check.ruleProfileVersionId));
    const lines = linesFromCheck(
      {
        number: check.number,
        record: readGradeCheckRecord(check),
        landingLengthFt: (version.profile as RuleProfile).landing.lengthFt,
      },
      prices,
    );
    const totals = quoteTotals(lines, prices.salesTaxBp, prices.depositBp);
    const sentAt = new Date(now - demo.sentDaysAgo * DAY);
    const acceptedAt = demo.answer === 'accepted' ? new Date(sentAt.getTime() + 2 * DAY) : null;
    await tx.insert(quotes).values({
      requestId: request.id,
      version: 1,
      status: demo.answer ?? 'sent',
      gradeCheckId: check.id,
      rateCardVersionId: card.id,
      lines: pricedLines(lines),
      subtotalCents: totals.subtotalCents,
      taxCents: totals.taxCents,
      totalCents: totals.totalCents,
      depositCents: totals.depositCents,
      taxRateBp: prices.salesTaxBp,
      depositRateBp: prices.depositBp,
      terms: DEFAULT_TERMS,
      validUntil: isoDate(new Date(sentAt.getTime() + 30 * DAY)),
      createdById: office.id,
      createdAt: sentAt,
      updatedAt: acceptedAt ?? sentAt,
      sentAt,
      sentById: office.id,
      acceptedAt,
      acceptedName: acceptedAt ? request.applicantName : null,
      acceptedById: acceptedAt ? request.applicantId : null,
    });
    await tx.insert(requestEvents).values({
      requestId: request.id,
      actorId: office.id,
      kind: 'quote-sent',
      note: `Quote version 1 sent: total ${formatCents(totals.totalCents)}, deposit ${formatCents(totals.depositCents)}.`,
      createdAt: sentAt,
    });
    if (acceptedAt)
      await tx.insert(requestEvents).values({
        requestId: request.id,
        actorId: request.applicantId,
        kind: 'quote-accepted',
        note: `Quote version 1 accepted by ${request.applicantName}, typing the name “${request.applicantName}”.`,
        createdAt: acceptedAt,
      });
  }
}

/**
 * The demo's sent quotes get their PDFs, stored and shared with the owner as sending one in the app does, dated with
 * the sending. Like the demo reports it runs once storage is up; a quote that has its PDF is left alone.
 */
export async function seedDemoQuotePdfs(ctx: Pick<AppContext, 'db' | 's3' | 'env'>) {
  const missing = await ctx.db
    .select({ quote: quotes, request: requests })
    .from(quotes)
    .innerJoin(requests, eq(requests.id, quotes.requestId))
    .where(and(isNull(quotes.documentId), ne(quotes.status, 'draft')));
  for (const { quote, request } of missing) {
    const pdf = await sentQuotePdf(ctx.db, quote, request);
    const objectKey = `quotes/${request.id}/quote-${quote.version}-${quote.id}.pdf`;
    await storeReport(ctx, objectKey, pdf);
    await ctx.db.transaction(async (tx) => {
      const [document] = await tx
        .insert(documents)
        .values({
          requestId: request.id,
          gradeCheckId: quote.gradeCheckId,
          kind: 'quote',
          title: `Quote version ${quote.version}`,
          objectKey,
          contentType: 'application/pdf',
          sizeBytes: pdf.length,
          sharedWithApplicant: true,
          createdById: quote.sentById,
          createdAt: quote.sentAt ?? quote.createdAt,
        })
        .returning();
      await tx.update(quotes).set({ documentId: document.id }).where(eq(quotes.id, quote.id));
    });
  }
  return missing.length;
}
