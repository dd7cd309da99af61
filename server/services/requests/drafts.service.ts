import { and, count, desc, eq } from 'drizzle-orm';
import { applicationDraftSchema, type ApplicationDraft } from '@shared/requests/application-schema';
import { answerEditableStatuses } from '@shared/contracts/requests';
import type { SessionUser } from '../../lib/session-user';
import type { Db } from '../../db/client';
import { requests, users } from '../../db/schema';
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
