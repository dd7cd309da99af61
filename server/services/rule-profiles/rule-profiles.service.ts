import { and, asc, desc, eq, max } from 'drizzle-orm';
import { commonRuralTemplate, ruleProfileSchema, type RuleProfile } from '@shared/engine';
import type { SessionUser } from '../../lib/session-user';
import type { Db, DbOrTx } from '../../db/client';
import { jurisdictions, ruleProfileVersions } from '../../db/schema';
import { conflict, notFound } from '../../lib/errors';
import { recordAdminChange } from '../audit/audit.service';

export type VersionRow = typeof ruleProfileVersions.$inferSelect;
export type JurisdictionRow = typeof jurisdictions.$inferSelect;

/**
 * The profile as stored: the engine's parsed form, stamped with the version's id, number and the jurisdiction's
 * name so a check run from it later names exactly what it was checked against.
 */
export function stampProfile(
  profile: unknown,
  version: { id: string; version: number },
  jurisdictionName: string,
): RuleProfile {
  const parsed = ruleProfileSchema.parse(profile);
  return { ...parsed, id: version.id, version: version.version, jurisdictionName };
}

export async function listJurisdictions(db: DbOrTx) {
  const rows = await db.select().from(jurisdictions).orderBy(asc(jurisdictions.name));
  const versions = await db
    .select({
      id: ruleProfileVersions.id,
      jurisdictionId: ruleProfileVersions.jurisdictionId,
      version: ruleProfileVersions.version,
      status: ruleProfileVersions.status,
      publishedAt: ruleProfileVersions.publishedAt,
      changeNote: ruleProfileVersions.changeNote,
      createdAt: ruleProfileVersions.createdAt,
    })
    .from(ruleProfileVersions)
    .orderBy(desc(ruleProfileVersions.version));
  return rows.map((j) => ({ ...j, versions: versions.filter((v) => v.jurisdictionId === j.id) }));
}

export async function loadJurisdiction(db: DbOrTx, id: string) {
  const [row] = await db.select().from(jurisdictions).where(eq(jurisdictions.id, id));
  if (!row) throw notFound('Jurisdiction');
  const versions = await db
    .select()
    .from(ruleProfileVersions)
    .where(eq(ruleProfileVersions.jurisdictionId, id))
    .orderBy(desc(ruleProfileVersions.version));
  return { ...row, versions };
}

export async function loadVersion(db: DbOrTx, id: string, opts: { forUpdate?: boolean } = {}) {
  const query = db.select().from(ruleProfileVersions).where(eq(ruleProfileVersions.id, id));
  const [row] = opts.forUpdate ? await query.for('update') : await query;
  if (!row) throw notFound('Rule profile version');
  return row;
}

const slugOf = (name: string) =>
  name
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '')
    .slice(0, 60) || 'jurisdiction';

/** A new road authority starts with a draft copied from the common rural template. */
export async function createJurisdiction(db: Db, actor: SessionUser, input: { name: string; authority: string }) {
  return db.transaction(async (tx) => {
    const slug = slugOf(input.name);
    const [taken] = await tx.select({ id: jurisdictions.id }).from(jurisdictions).where(eq(jurisdictions.slug, slug));
    if (taken) throw conflict(`A jurisdiction called "${input.name}" already exists.`);
    const [row] = await tx
      .insert(jurisdictions)
      .values({ slug, name: input.name, authority: input.authority })
      .returning();
    const [draft] = await tx
      .insert(ruleProfileVersions)
      .values({
        jurisdictionId: row.id,
        version: 1,
        status: 'draft',
        profile: {},
        changeNote: 'Started from the common rural template',
        createdById: actor.id,
      })
      .returning();
    const profile = stampProfile({ ...commonRuralTemplate, name: `${input.name} access rules` }, draft, row.name);
    await tx.update(ruleProfileVersions).set({ profile }).where(eq(ruleProfileVersions.id, draft.id));
    return { jurisdiction: row, draftId: draft.id };
  });
}

/** The next version starts as a copy of one the admin picks (the current one unless told otherwise). */
export async function createDraft(db: Db, actor: SessionUser, jurisdictionId: string, fromVersionId?: string) {
  return db.transaction(async (tx) => {
    const [j] = await tx.select().from(jurisdictions).where(eq(jurisdictions.id, jurisdictionId)).for('update');
    if (!j) throw notFound('Jurisdiction');
    const [openDraft] = await tx
      .select({ id: ruleProfileVersions.id, version: ruleProfileVersions.version })
      .from(ruleProfileVersions)
      .where(and(eq(ruleProfileVersions.jurisdictionId, j.id), eq(ruleProfileVersions.status, 'draft')));
    if (openDraft) throw conflict(`Version ${openDraft.version} is still a draft: edit or publish it first.`);
    const sourceId = fromVersionId ?? j.currentVersionId;
    const source = sourceId ? await loadVersion(tx, sourceId) : undefined;
    if (source && source.jurisdictionId !== j.id) throw notFound('Rule profile version');
    const [{ last }] = await tx
      .select({ last: max(ruleProfileVersions.version) })
      .from(ruleProfileVersions)
      .where(eq(ruleProfileVersions.jurisdictionId, j.id));
    const number = (last ?? 0) + 1;
    const [draft] = await tx
      .insert(ruleProfileVersions)
      .values({
        jurisdictionId: j.id,
        version: number,
        status: 'draft',
        profile: {},
        createdById: actor.id,
        changeNote: source ? `Copied from version ${source.version}` : 'Started from the common rural template',
      })
      .returning();
    const profile = stampProfile(source?.profile ?? commonRuralTemplate, draft, j.name);
    const [saved] = await tx
      .update(ruleProfileVersions)
      .set({ profile })
      .where(eq(ruleProfileVersions.id, draft.id))
      .returning();
    return saved;
  });
}

export async function updateDraft(db: Db, id: string, input: { profile: RuleProfile; changeNote?: string }) {
  return db.transaction(async (tx) => {
    const row = await loadVersion(tx, id, { forUpdate: true });
    if (row.status !== 'draft')
      throw conflict(`Version ${row.version} is published and can no longer be edited; start a new version.`);
    const [j] = await tx.select().from(jurisdictions).where(eq(jurisdictions.id, row.jurisdictionId));
    const profile = stampProfile(input.profile, row, j.name);
    const [saved] = await tx
      .update(ruleProfileVersions)
      .set({ profile, ...(input.changeNote === undefined ? {} : { changeNote: input.changeNote }) })
      .where(eq(ruleProfileVersions.id, id))
      .returning();
    return saved;
  });
}

/** Publishing freezes the version and makes it the jurisdiction's current one. */
export async function publishVersion(db: Db, actor: SessionUser, id: string) {
  return db.transaction(async (tx) => {
    const row = await loadVersion(tx, id, { forUpdate: true });
    if (row.status !== 'draft') throw conflict(`Version ${row.version} is already published.`);
    const [saved] = await tx
      .update(ruleProfileVersions)
      .set({ status: 'published', publishedAt: new Date(), publishedById: actor.id })
      .where(eq(ruleProfileVersions.id, id))
      .returning();
    await tx.update(jurisdictions).set({ currentVersionId: id }).where(eq(jurisdictions.id, row.jurisdictionId));
    const [place] = await tx
      .select({ name: jurisdictions.name })
      .from(jurisdictions)
      .where(eq(jurisdictions.id, row.jurisdictionId));
    await recordAdminChange(tx, actor, {
      kind: 'version-published',
      subjectId: id,
      summary: `Published version ${row.version} of the ${place?.name ?? 'road authority'} rule profile${row.changeNote ? `: ${row.changeNote}` : ''}.`,
    });
    return saved;
  });
}
