import { and, desc, eq } from 'drizzle-orm';
import { checkAsBuilt, EngineInputError, type AsBuiltReadingResult, type AsBuiltStatus } from '@shared/engine';
import type { SaveAsBuiltInput } from '@shared/crew/crew-inputs';
import type { AsBuiltPageView, AsBuiltSetView } from '@shared/crew/crew-views';
import { crewStages, statusText } from '@shared/workflow/statuses';
import type { SessionUser } from '../../lib/session-user';
import type { Db, DbOrTx } from '../../db/client';
import { asBuiltSets, users } from '../../db/schema';
import { AppError, conflict } from '../../lib/errors';
import { idempotencyHeader, type IdempotencyKey } from '../../lib/idempotency';
import { loadVisibleRequest } from '../requests/request-access';
import { ruleProfileLabel, loadJobCheck, type SavedCheck } from './saved-check';

export async function requireJobCheck(db: DbOrTx, requestId: string): Promise<SavedCheck> {
  const check = await loadJobCheck(db, requestId);
  if (!check) throw conflict('This job has no saved grade check to build against; ask the office to attach one.');
  return check;
}

/** The engine on the server is the record: the same profile version the approved check used, the same design. */
export function verifyReadings(check: SavedCheck, readings: SaveAsBuiltInput['readings']) {
  try {
    const shots = readings.map((r) =>
      r.gradePercent !== undefined
        ? { stationFt: r.stationFt, gradePercent: r.gradePercent }
        : { stationFt: r.stationFt, elevationFt: r.elevationFt ?? Number.NaN },
    );
    return checkAsBuilt({
      readings: shots,
      ruleProfile: check.ruleProfile,
      design: check.designPoints,
      roadEdgeStationFt: check.roadEdgeStationFt,
    });
  } catch (error) {
    if (!(error instanceof EngineInputError)) throw error;
    const fields: Record<string, string> = {};
    for (const issue of error.issues) {
      // The engine names its own intermediate values (such as the grade it derives between two shots); the crew
      // typed readings, so anything else is said about the readings.
      if (issue.field.startsWith('readings')) fields[issue.field] ??= issue.message;
      else fields.readings ??= 'these readings give a grade no entrance can have: check each station and elevation';
    }
    throw new AppError(
      400,
      'invalid_input',
      `The readings cannot be checked as entered: ${Object.keys(fields).join(', ')}.`,
      fields,
    );
  }
}

export async function listSets(db: DbOrTx, requestId: string): Promise<AsBuiltSetView[]> {
  const rows = await db
    .select({ set: asBuiltSets, crewName: users.name })
    .from(asBuiltSets)
    .innerJoin(users, eq(users.id, asBuiltSets.crewId))
    .where(eq(asBuiltSets.requestId, requestId))
    .orderBy(desc(asBuiltSets.createdAt))
    .limit(50);
  return rows.map(({ set, crewName }) => {
    const stored = set.results as
      { readings?: AsBuiltReadingResult[]; status?: AsBuiltStatus } | AsBuiltReadingResult[];
    const results = Array.isArray(stored) ? stored : (stored.readings ?? []);
    const status = Array.isArray(stored)
      ? set.passed
        ? 'pass'
        : 'fail'
      : (stored.status ?? (set.passed ? 'pass' : 'fail'));
    return {
      id: set.id,
      readings: set.readings as AsBuiltSetView['readings'],
      results,
      status,
      passed: set.passed,
      note: set.note,
      replacesSetId: set.replacesSetId,
      crewName,
      createdAt: set.createdAt.toISOString(),
    };
  });
}

export async function asBuiltPage(db: Db, user: SessionUser, requestId: string): Promise<AsBuiltPageView> {
  const row = await loadVisibleRequest(db, user, requestId);
  if (!crewStages.includes(row.status)) throw new AppError(404, 'not_found', 'Job was not found.');
  const check = await requireJobCheck(db, row.id);
  return {
    job: {
      requestId: row.id,
      reference: row.reference,
      status: row.status,
      version: row.version,
      siteAddress: row.siteAddress,
    },
    ruleProfile: check.ruleProfile,
    ruleProfileLabel: ruleProfileLabel(check.ruleProfile),
    design: check.designPoints,
    roadEdgeStationFt: check.roadEdgeStationFt,
    sets: await listSets(db, row.id),
  };
}

/**
 * The set stored earlier under this crew's key, if any. The same key with other readings (or for another job) is
 * refused by name: answering the first set would tell the phone its new readings were stored when they were not.
 */
async function earlierSet(tx: DbOrTx, crew: SessionUser, requestId: string, idem: IdempotencyKey) {
  const [earlier] = await tx
    .select({ id: asBuiltSets.id, requestId: asBuiltSets.requestId, digest: asBuiltSets.idempotencyDigest })
    .from(asBuiltSets)
    .where(and(eq(asBuiltSets.crewId, crew.id), eq(asBuiltSets.idempotencyKey, idem.key)));
  if (!earlier) return null;
  if (earlier.requestId !== requestId || earlier.digest !== idem.digest) {
    throw new AppError(
      409,
      'idempotency_key_reused',
      `This ${idempotencyHeader} was already used for other readings; send new readings with a new key.`,
      { [idempotencyHeader]: 'was already used for a different set of readings' },
    );
  }
  const [view] = (await listSets(tx, requestId)).filter((s) => s.id === earlier.id);
  return view ?? null;
}

/**
 * A set of finished-grade readings, checked and stored; failing sets are kept too, they are the site's record.
 * With an idempotency key, a set sent again (the phone never heard the first answer) is stored once and answered
 * with the first answer, whatever the job's status is now.
 */
export async function saveAsBuiltSet(
  db: Db,
  crew: SessionUser,
  requestId: string,
  input: SaveAsBuiltInput,
  idem?: IdempotencyKey,
): Promise<{ set: AsBuiltSetView; replayed: boolean }> {
  return db.transaction(async (tx) => {
    // The job's row lock comes first, so two sends of one key for this job take turns and the second finds the first.
    const row = await loadVisibleRequest(tx, crew, requestId, { forUpdate: true });
    if (idem) {
      const earlier = await earlierSet(tx, crew, row.id, idem);
      if (earlier) return { set: earlier, replayed: true };
    }
    if (row.status !== 'under_construction' || row.crewId !== crew.id) {
      throw conflict(
        `As-built readings are taken while the job is being built; this one is "${statusText[row.status].label}".`,
      );
    }
    const check = await requireJobCheck(tx, row.id);
    if (input.replacesSetId) {
      // Only the latest set can be corrected: an edit of an older one would hide the set saved after it.
      const latest = await latestSet(tx, row.id);
      if (!latest || latest.id !== input.replacesSetId)
        throw conflict(
          'The set you edited is no longer the latest one saved for this job. Reload the page to edit the latest set.',
        );
    }
    const verdict = verifyReadings(check, input.readings);
    const [set] = await tx
      .insert(asBuiltSets)
      .values({
        requestId: row.id,
        gradeCheckId: check.id,
        crewId: crew.id,
        readings: input.readings,
        results: { readings: verdict.readings, status: verdict.status, ruleProfileVersionId: check.ruleProfile.id },
        passed: verdict.passes,
        note: input.note ?? '',
        replacesSetId: input.replacesSetId ?? null,
        idempotencyKey: idem?.key ?? null,
        idempotencyDigest: idem?.digest ?? null,
      })
      .returning();
    const [view] = (await listSets(tx, row.id)).filter((s) => s.id === set.id);
    return { set: view, replayed: false };
  });
}

export async function latestSet(db: DbOrTx, requestId: string) {
  const [set] = await db
    .select()
    .from(asBuiltSets)
    .where(eq(asBuiltSets.requestId, requestId))
    .orderBy(desc(asBuiltSets.createdAt))
    .limit(1);
  return set ?? null;
}
