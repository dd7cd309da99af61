import { and, asc, desc, eq, isNotNull } from 'drizzle-orm';
import type { RuleProfile } from '@shared/engine';
import { readGradeCheckRecord } from '@shared/grade-check/stored-check';
import { quoteTotals } from '@shared/money/money';
import type { AppContext } from '../../config/context';
import { gradeChecks, payments, quotes, requestEvents, requests, ruleProfileVersions, users } from '../../db/schema';
import type { SessionUser } from '../../lib/session-user';
import { confirmReturn, startCheckout } from '../../services/payments/checkout.service';
import { recordOfflinePayment, refundPayment } from '../../services/payments/office-payments.service';
import { insertPayment } from '../../services/payments/record-payment';
import { DEFAULT_TERMS, pricedLines } from '../../services/quotes/quotes.service';
import { linesFromCheck } from '../../services/quotes/lines-from-check';
import { pricesOf } from '../../services/rate-cards/rate-cards.service';
import { seedRateCard } from './demo-rate-card';

type Step =
  | { kind: 'deposit' | 'balance'; by: 'card' }
  | { kind: 'deposit' | 'balance'; by: 'cheque'; note: string }
  /** Paid before the request ended (written as the workflow left it), then handed back by the admin. */
  | { kind: 'deposit'; by: 'cheque-then-refund'; note: string; refund: string };

/** The money stages the demo shows, by the demo request's site address. */
const moneyStages: { address: string; steps: Step[] }[] = [
  // The quote's own seed leaves 904 Old Mill Road accepted with nothing paid: the deposit is due there.
  { address: '904 Old Mill Road, Marrow Crossing', steps: [] },
  { address: '12 Heronsgate Road, Marrow Crossing', steps: [{ kind: 'deposit', by: 'card' }] },
  {
    address: '51 Bramblewood Drive, Elderbrook',
    steps: [{ kind: 'deposit', by: 'cheque', note: 'Cheque 2231, Elderbrook Farmers Bank' }],
  },
  { address: '400 Larkspur Ridge Road, Elderbrook', steps: [{ kind: 'deposit', by: 'card' }] },
  {
    address: '18 Fernhill Road, Marrow Crossing',
    steps: [
      { kind: 'deposit', by: 'card' },
      { kind: 'balance', by: 'card' },
    ],
  },
  {
    address: '27 Kestrel Bend Road, Marrow Crossing',
    steps: [
      {
        kind: 'deposit',
        by: 'cheque-then-refund',
        note: 'Cheque 0718, Marrow Credit Union',
        refund: 'The permit was refused and the owner is not going ahead; the deposit goes back in full.',
      },
    ],
  },
];

const person = async (ctx: Pick<AppContext, 'db'>, id: string): Promise<SessionUser> => {
  const [u] = await ctx.db.select().from(users).where(eq(users.id, id));
  return { id: u.id, email: u.email, name: u.name, role: u.role };
};

/**
 * Accepted quotes and payments on the demo requests at each money stage. Card payments go through the payments
 * stand-in the way an owner pays (the payment page, then the return), so it must be running. A request that already
 * has a quote keeps it; one that already has payments is left alone, so running it again changes nothing.
 */
export async function seedDemoPayments(ctx: AppContext) {
  const card = await seedRateCard(ctx.db);
  const [admin] = await ctx.db.select().from(users).where(eq(users.role, 'admin')).limit(1);
  const [office] = await ctx.db.select().from(users).where(eq(users.role, 'staff')).limit(1);
  if (!admin || !office) return;
  for (const stage of moneyStages) {
    const [request] = await ctx.db.select().from(requests).where(eq(requests.siteAddress, stage.address));
    if (!request) continue;
    const quote = await acceptedDemoQuote(ctx, request, pricesOf(card), card.id, office.id);
    if (!quote) continue;
    const [paid] = await ctx.db.select({ id: payments.id }).from(payments).where(eq(payments.requestId, request.id));
    if (paid) continue;
    const owner = await person(ctx, request.applicantId);
    for (const step of stage.steps) {
      if (step.by === 'card') await payByCard(ctx, owner, request.id, step.kind);
      else if (step.by === 'cheque')
        await recordOfflinePayment(ctx, await person(ctx, office.id), request.id, { kind: step.kind, note: step.note });
      else {
        const row = await ctx.db.transaction((tx) =>
          insertPayment(tx, ctx, {
            requestId: request.id,
            kind: step.kind,
            method: 'offline',
            amountCents: quote.depositCents,
            currency: ctx.env.PAYMENT_CURRENCY,
            quoteId: quote.id,
            note: step.note,
            recordedById: office.id,
            paidAt: new Date(request.statusChangedAt.getTime() - 5 * 86_400_000),
          }),
        );
        if (row) await refundPayment(ctx, await person(ctx, admin.id), row.id, step.refund);
      }
    }
  }
}

/** The owner's way: ask for the payment page, pay with the test card that pays, come back. */
async function payByCard(ctx: AppContext, owner: SessionUser, requestId: string, kind: 'deposit' | 'balance') {
  const { url } = await startCheckout(ctx, owner, requestId, kind);
  const paid = await fetch(url, {
    method: 'POST',
    redirect: 'manual',
    headers: { 'content-type': 'application/x-www-form-urlencoded' },
    body: new URLSearchParams({ card: '4242424242424242', expiry: '12/30', code: '123' }),
  });
  const back = paid.headers.get('location');
  const sessionId = back ? new URL(back).searchParams.get('session_id') : null;
  if (!sessionId) throw new Error(`the payments stand-in did not take the demo payment (${paid.status})`);
  await confirmReturn(ctx, owner, requestId, sessionId);
}

/**
 * The request's accepted quote, or one written as the workflow would have left it (priced from its attached grade
 * check and the demo rate card, sent and accepted by the owner typing their name) when it has no quote at all.
 */
async function acceptedDemoQuote(
  ctx: AppContext,
  request: typeof requests.$inferSelect,
  prices: ReturnType<typeof pricesOf>,
  cardId: string,
  officeId: string,
) {
  const existing = await ctx.db
    .select()
    .from(quotes)
    .where(eq(quotes.requestId, request.id))
    .orderBy(desc(quotes.version));
  if (existing.length > 0) return existing.find((q) => q.status === 'accepted') ?? null;
  const [check] = await ctx.db
    .select()
    .from(gradeChecks)
    .where(and(eq(gradeChecks.requestId, request.id), isNotNull(gradeChecks.attachedAt)))
    .orderBy(asc(gradeChecks.number))
    .limit(1);
  if (!check) return null;
  const [rules] = await ctx.db
    .select({ profile: ruleProfileVersions.profile })
    .from(ruleProfileVersions)
    .where(eq(ruleProfileVersions.id, check.ruleProfileVersionId));
  const lines = linesFromCheck(
    {
      number: check.number,
      record: readGradeCheckRecord(check),
      landingLengthFt: (rules?.profile as RuleProfile | undefined)?.landing?.lengthFt ?? 0,
    },
    prices,
  );
  const totals = quoteTotals(lines, prices.salesTaxBp, prices.depositBp);
  const sentAt = new Date(check.createdAt.getTime() + 86_400_000);
  const acceptedAt = new Date(sentAt.getTime() + 2 * 86_400_000);
  return ctx.db.transaction(async (tx) => {
    const [quote] = await tx
      .insert(quotes)
      .values({
        requestId: request.id,
        version: 1,
        status: 'accepted',
        gradeCheckId: check.id,
        rateCardVersionId: cardId,
        lines: pricedLines(lines),
        subtotalCents: totals.subtotalCents,
        taxCents: totals.taxCents,
        totalCents: totals.totalCents,
        taxRateBp: prices.salesTaxBp,
        depositRateBp: prices.depositBp,
        depositCents: totals.depositCents,
        terms: DEFAULT_TERMS,
        validUntil: new Date(sentAt.getTime() + 30 * 86_400_000).toISOString().slice(0, 10),
        createdById: officeId,
        createdAt: sentAt,
        updatedAt: sentAt,
        sentAt,
        sentById: officeId,
        acceptedAt,
        acceptedName: request.applicantName,
        acceptedById: request.applicantId,
      })
      .returning();
    await tx.insert(requestEvents).values([
      {
        requestId: request.id,
        actorId: officeId,
        kind: 'quote-sent',
        note: 'Quote version 1 sent.',
        createdAt: sentAt,
      },
      {
        requestId: request.id,
        actorId: request.applicantId,
        kind: 'quote-accepted',
        note: `Quote version 1 accepted by ${request.applicantName}.`,
        createdAt: acceptedAt,
      },
    ]);
    return quote;
  });
}
