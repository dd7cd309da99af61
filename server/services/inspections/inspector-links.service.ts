import { and, desc, eq } from 'drizzle-orm';
import { createHash, randomBytes, timingSafeEqual } from 'node:crypto';
import { sharedPaths } from '@shared/paths';
import type { InspectorLinkState, InspectorLinkView, SendInspectorLinkInput } from '@shared/contracts/inspections';
import { statusText } from '@shared/workflow/statuses';
import type { SessionUser } from '../../lib/session-user';
import type { AppContext } from '../../config/context';
import type { DbOrTx } from '../../db/client';
import { inspectorLinks, requestEvents, requests } from '../../db/schema';
import { conflict, notFound } from '../../lib/errors';
import { enqueueEmails } from '../email/outbox';
import { inspectorLinkEmail } from '../email/inspection-emails';
import { loadVisibleRequest } from '../requests/request-access';

export type InspectorLinkRow = typeof inspectorLinks.$inferSelect;
type LinkContext = Pick<AppContext, 'db' | 'env'>;

const DAY_MS = 86_400_000;

/** 32 random bytes: the token is the secret; only its SHA-256 is stored, so the table alone opens nothing. */
const newToken = () => randomBytes(32).toString('base64url');
export const hashToken = (token: string) => createHash('sha256').update(token, 'utf8').digest('hex');

export function linkState(link: InspectorLinkRow, now = new Date()): InspectorLinkState {
  if (link.revokedAt) return 'withdrawn';
  if (link.outcomeAt) return 'used';
  if (link.expiresAt.getTime() <= now.getTime()) return 'expired';
  return 'open';
}

export const linkView = (link: InspectorLinkRow, now = new Date()): InspectorLinkView<Date> => ({
  id: link.id,
  inspectorName: link.inspectorName,
  inspectorEmail: link.inspectorEmail,
  createdAt: link.createdAt,
  expiresAt: link.expiresAt,
  revokedAt: link.revokedAt,
  lastOpenedAt: link.lastOpenedAt,
  outcomeAt: link.outcomeAt,
  state: linkState(link, now),
});

/** The page's address: the token rides in the #fragment, which browsers never send to a server or in a Referer. */
export const inspectorPageUrl = (appOrigin: string, requestId: string, token: string) =>
  `${appOrigin}${sharedPaths.inspectorPage.getHref(requestId)}#t=${token}`;

/**
 * The office sends the road authority's inspector a link to the built job. Written with its e-mail and an
 * office-only history entry in one transaction; the token is answered once and never stored.
 */
export async function sendInspectorLink(
  ctx: LinkContext,
  user: SessionUser,
  requestId: string,
  input: Required<SendInspectorLinkInput>,
  now = new Date(),
) {
  return ctx.db.transaction(async (tx) => {
    const row = await loadVisibleRequest(tx, user, requestId, { forUpdate: true });
    if (row.status !== 'built') {
      throw conflict(
        `An inspector’s link is sent once the crew has marked the job built; this one is "${statusText[row.status].label}" (${row.status}).`,
      );
    }
    const token = newToken();
    const [link] = await tx
      .insert(inspectorLinks)
      .values({
        requestId,
        tokenHash: hashToken(token),
        inspectorName: input.inspectorName,
        inspectorEmail: input.inspectorEmail,
        createdById: user.id,
        createdAt: now,
        expiresAt: new Date(now.getTime() + input.daysValid * DAY_MS),
      })
      .returning();
    const [event] = await tx
      .insert(requestEvents)
      .values({
        requestId,
        actorId: user.id,
        kind: 'inspector-link-sent',
        internal: true,
        note: `Link sent to ${input.inspectorName} <${input.inspectorEmail}>, open until ${link.expiresAt.toISOString().slice(0, 10)}.`,
      })
      .returning({ id: requestEvents.id });
    const url = inspectorPageUrl(ctx.env.APP_ORIGIN, requestId, token);
    await enqueueEmails(tx, [
      { ...inspectorLinkEmail({ request: row, link, url, officeEmail: ctx.env.OFFICE_EMAIL }), eventId: event.id },
    ]);
    await tx.update(requests).set({ updatedAt: now }).where(eq(requests.id, requestId));
    return { link, url };
  });
}

export async function listLinks(db: DbOrTx, requestId: string) {
  return db
    .select()
    .from(inspectorLinks)
    .where(eq(inspectorLinks.requestId, requestId))
    .orderBy(desc(inspectorLinks.createdAt));
}

/** The office withdraws a link: from then on it opens nothing. Withdrawing twice is harmless. */
export async function revokeInspectorLink(db: DbOrTx, user: SessionUser, requestId: string, linkId: string) {
  await loadVisibleRequest(db, user, requestId);
  const [link] = await db
    .select()
    .from(inspectorLinks)
    .where(and(eq(inspectorLinks.id, linkId), eq(inspectorLinks.requestId, requestId)));
  if (!link) throw notFound('Link');
  if (link.revokedAt) return link;
  const [revoked] = await db
    .update(inspectorLinks)
    .set({ revokedAt: new Date(), revokedById: user.id })
    .where(eq(inspectorLinks.id, linkId))
    .returning();
  await db.insert(requestEvents).values({
    requestId,
    actorId: user.id,
    kind: 'inspector-link-revoked',
    internal: true,
    note: `Link for ${link.inspectorName} withdrawn.`,
  });
  return revoked;
}

/** Every way a link can fail to open answers the same 404, so nothing tells a guess from a withdrawn link. */
const closed = () => notFound('Inspection page');

/**
 * The link that opens this request's page: the token's hash must be stored for this very request, not withdrawn
 * and not expired. A link whose outcome is recorded still opens (read-only) until it expires.
 */
export async function resolveLink(db: DbOrTx, requestId: string, token: string | undefined, now = new Date()) {
  if (!token || token.length < 20 || token.length > 200) throw closed();
  const hash = hashToken(token);
  const [link] = await db.select().from(inspectorLinks).where(eq(inspectorLinks.tokenHash, hash));
  if (!link || !timingSafeEqual(Buffer.from(link.tokenHash), Buffer.from(hash))) throw closed();
  if (link.requestId !== requestId) throw closed();
  const state = linkState(link, now);
  if (state === 'withdrawn' || state === 'expired') throw closed();
  return link;
}
