import { DeleteObjectCommand } from '@aws-sdk/client-s3';
import { and, count, desc, eq } from 'drizzle-orm';
import { applicationDraftSchema, type ApplicationDraft } from '@shared/requests/application-schema';
import { answerEditableStatuses } from '@shared/contracts/requests';
import type { SessionUser } from '../../lib/session-user';
import type { AppContext } from '../../config/context';
import type { Db } from '../../db/client';
import { emails, messages, photos, requestEvents, requests, users } from '../../db/schema';
import { conflict } from '../../lib/errors';
import { loadVisibleRequest } from './request-access';
import { nextReference } from './reference';

export const editableStatuses = new Set<string>(answerEditableStatuses);

/** Unsent requests one owner may have at once: enough for several properties, not for filling the database. */
export const maxOpenDrafts = 5;

export async function createDraft(db: Db, user: SessionUser) {
  return db.transaction(async (tx) => {
    // The owner's row is the lock that makes two clicks at once count one after the other.
    await tx.select({ id: users.id }).from(users).where(eq(users.id, user.id)).for('update');
    const [open] = await tx
      .select({ n: count() })
      .from(requests)
      .where(and(eq(requests.applicantId, user.id), eq(requests.status, 'draft')));
    if (open.n >= maxOpenDrafts) {
      throw conflict(
        `You already have ${maxOpenDrafts} requests that are not sent yet. Send one, or withdraw one you no longer need, before starting another.`,
      );
    }
    const reference = await nextReference(tx);
    const [row] = await tx
      .insert(requests)
      .values({ reference, applicantId: user.id, applicantName: user.name, application: {} })
      .returning();
    return row;
  });
}

export interface DraftChange extends ApplicationDraft {
  expectedVersion: number;
  wizardStep?: number;
}

/** Saves one or both steps; a step that is sent replaces the saved one, so a cleared field stays cleared. */
export async function saveDraft(db: Db, user: SessionUser, id: string, change: DraftChange) {
  return db.transaction(async (tx) => {
    const row = await loadVisibleRequest(tx, user, id, { forUpdate: true });
    if (row.applicantId !== user.id) throw conflict('Only the person who made this request can change its answers.');
    if (!editableStatuses.has(row.status))
      throw conflict(
        'This request is with the office and its answers can no longer be changed here. Send the office a message instead.',
      );
    if (row.version !== change.expectedVersion) {
      throw conflict(
        `This request was changed elsewhere (now version ${row.version}, you had ${change.expectedVersion}). Reload to continue from the latest.`,
      );
    }
    const saved = applicationDraftSchema.safeParse(row.application);
    const application = { ...(saved.success ? saved.data : {}) };
    if (change.site) application.site = change.site;
    if (change.entrance) application.entrance = change.entrance;
    const site = application.site ?? {};
    const byCoordinates = site.positionKind === 'coordinates';
    const [updated] = await tx
      .update(requests)
      .set({
        application,
        wizardStep: change.wizardStep ?? row.wizardStep,
        siteAddress: site.address ?? '',
        roadName: site.roadName ?? '',
        siteLat: byCoordinates ? (site.siteLat ?? null) : null,
        siteLng: byCoordinates ? (site.siteLng ?? null) : null,
        version: row.version + 1,
        updatedAt: new Date(),
      })
      .where(and(eq(requests.id, row.id), eq(requests.version, row.version)))
      .returning();
    return updated;
  });
}

export function listMine(db: Db, user: SessionUser) {
  return db
    .select()
    .from(requests)
    .where(eq(requests.applicantId, user.id))
    .orderBy(desc(requests.updatedAt))
    .limit(200);
}

/**
 * Deletes a request its owner never sent, with what hangs on it (photos, its own history rows). Nothing of a draft
 * has reached the office, so nothing is kept; the photos' stored objects are removed once the rows are gone (a
 * storage failure then leaves an object nobody can reach, which is logged, never the request half-deleted).
 */
export async function deleteDraft(
  ctx: Pick<AppContext, 'db' | 's3' | 'env' | 'logger'>,
  user: SessionUser,
  id: string,
) {
  const objectKeys = await ctx.db.transaction(async (tx) => {
    const row = await loadVisibleRequest(tx, user, id, { forUpdate: true });
    if (row.applicantId !== user.id) throw conflict('Only the person who started this request can delete it.');
    if (row.status !== 'draft')
      throw conflict('This request has been sent to the office, so it cannot be deleted. You can withdraw it instead.');
    const gone = await tx.delete(photos).where(eq(photos.requestId, row.id)).returning({ key: photos.objectKey });
    await tx.delete(requestEvents).where(eq(requestEvents.requestId, row.id));
    await tx.delete(messages).where(eq(messages.requestId, row.id));
    await tx.delete(emails).where(eq(emails.requestId, row.id));
    await tx.delete(requests).where(eq(requests.id, row.id));
    return gone.map((g) => g.key);
  });
  for (const key of objectKeys) {
    try {
      await ctx.s3.send(new DeleteObjectCommand({ Bucket: ctx.env.S3_BUCKET, Key: key }));
    } catch (error) {
      ctx.logger.warn({ err: error, key }, 'a deleted draft’s photo object could not be removed from storage');
    }
  }
}
