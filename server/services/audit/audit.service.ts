import { desc, eq } from 'drizzle-orm';
import type { AuditEntryView, AuditKind } from '@shared/contracts/audit';
import type { DbOrTx } from '../../db/client';
import { adminAuditEntries } from '../../db/schema';
import type { SessionUser } from '../../lib/session-user';

export interface AuditRecord {
  kind: AuditKind;
  summary: string;
  subjectId?: string | null;
  detail?: Record<string, unknown>;
}

/** Writes one entry of the administrators' log; call it inside the change's own transaction. */
export async function recordAdminChange(db: DbOrTx, actor: Pick<SessionUser, 'id' | 'name'>, entry: AuditRecord) {
  await db.insert(adminAuditEntries).values({
    actorId: actor.id,
    actorName: actor.name,
    kind: entry.kind,
    summary: entry.summary,
    subjectId: entry.subjectId ?? null,
    detail: entry.detail ?? {},
  });
}

/** The newest 500 changes first, optionally of one kind. */
export async function listAdminChanges(db: DbOrTx, filter: { kind?: AuditKind }): Promise<AuditEntryView<Date>[]> {
  const rows = await db
    .select({
      id: adminAuditEntries.id,
      kind: adminAuditEntries.kind,
      actorName: adminAuditEntries.actorName,
      summary: adminAuditEntries.summary,
      createdAt: adminAuditEntries.createdAt,
    })
    .from(adminAuditEntries)
    .where(filter.kind ? eq(adminAuditEntries.kind, filter.kind) : undefined)
    .orderBy(desc(adminAuditEntries.createdAt), desc(adminAuditEntries.id))
    .limit(500);
  return rows.map((r) => ({ ...r, kind: r.kind as AuditKind }));
}
