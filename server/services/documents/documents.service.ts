import { and, desc, eq } from 'drizzle-orm';
import type { SessionUser } from '../../lib/session-user';
import type { AppContext } from '../../config/context';
import type { Db } from '../../db/client';
import { documents, requestEvents } from '../../db/schema';
import { notFound } from '../../lib/errors';
import { loadVisibleRequest } from '../requests/request-access';
import { DOWNLOAD_SECONDS, downloadUrl } from '../reports/report-storage';

type DocumentRow = typeof documents.$inferSelect;

/** The homeowner sees only what the office shared; the office and the crew on the job see everything. */
async function visibleRows(db: Db, user: SessionUser, requestId: string) {
  const request = await loadVisibleRequest(db, user, requestId);
  const where =
    user.role === 'applicant'
      ? and(eq(documents.requestId, request.id), eq(documents.sharedWithApplicant, true))
      : eq(documents.requestId, request.id);
  return db.select().from(documents).where(where).orderBy(desc(documents.createdAt));
}

/** The list without links, for pages that fetch a short-lived link only when a document is opened. */
export async function listDocumentViews(db: Db, user: SessionUser, requestId: string) {
  return (await visibleRows(db, user, requestId)).map((row) => view(row, user));
}

export async function listDocuments(ctx: Pick<AppContext, 'db' | 's3' | 'env'>, user: SessionUser, requestId: string) {
  const rows = await visibleRows(ctx.db, user, requestId);
  const expiresAt = new Date(Date.now() + DOWNLOAD_SECONDS * 1000).toISOString();
  return Promise.all(
    rows.map(async (row) => ({ ...view(row, user), url: await downloadUrl(ctx, row), urlExpiresAt: expiresAt })),
  );
}

export async function documentLink(
  ctx: Pick<AppContext, 'db' | 's3' | 'env'>,
  user: SessionUser,
  requestId: string,
  documentId: string,
) {
  const row = (await visibleRows(ctx.db, user, requestId)).find((d) => d.id === documentId);
  if (!row) throw notFound('Document');
  return { url: await downloadUrl(ctx, row), expiresInSeconds: DOWNLOAD_SECONDS };
}

function view(row: DocumentRow, user: SessionUser) {
  const { objectKey: _key, createdById: _by, ...rest } = row;
  return user.role === 'applicant' ? { ...rest, sharedWithApplicant: true } : rest;
}

export async function setShared(db: Db, user: SessionUser, documentId: string, shared: boolean) {
  const [row] = await db.select().from(documents).where(eq(documents.id, documentId));
  if (!row) throw notFound('Document');
  await loadVisibleRequest(db, user, row.requestId);
  return db.transaction(async (tx) => {
    const [saved] = await tx
      .update(documents)
      .set({ sharedWithApplicant: shared })
      .where(eq(documents.id, documentId))
      .returning();
    if (row.sharedWithApplicant !== shared) {
      // Sharing is news to the owner; taking a document back is the office's business.
      await tx.insert(requestEvents).values({
        requestId: row.requestId,
        actorId: user.id,
        kind: 'document',
        internal: !shared,
        note: shared ? `${row.title} shared with the homeowner.` : `${row.title} no longer shared with the homeowner.`,
      });
    }
    return view(saved, user);
  });
}
