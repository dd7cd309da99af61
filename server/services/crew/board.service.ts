import { and, asc, eq, isNull } from 'drizzle-orm';
import type { BoardSort } from '@shared/crew/crew-inputs';
import type { BoardJob, BoardView } from '@shared/crew/crew-views';
import type { DbOrTx } from '../../db/client';
import { jobs, jurisdictions, requests } from '../../db/schema';
import { distanceFromYard, earthworkEstimate, siteCoordinates, wantedFrom } from './job-facts';
import { loadJobCheck } from './saved-check';
import { loadYard } from './yard.service';

export const permitOf = (r: {
  permitReference: string | null;
  permitConditions: string | null;
  permitDecidedOn: string | null;
  permitExpiresOn: string | null;
}) => ({
  reference: r.permitReference,
  conditions: r.permitConditions,
  decidedOn: r.permitDecidedOn,
  expiresOn: r.permitExpiresOn,
});

// Nothing wanted-by sorts after every date; ties go to the job that has waited longest on the board.
const byDate = (a: BoardJob, b: BoardJob) =>
  (a.wanted.wantedBy ?? '9999').localeCompare(b.wanted.wantedBy ?? '9999') || a.releasedAt.localeCompare(b.releasedAt);
const byDistance = (a: BoardJob, b: BoardJob) =>
  (a.distanceMiles ?? Infinity) - (b.distanceMiles ?? Infinity) || byDate(a, b);

/**
 * Released jobs nobody has taken yet. The board is small (jobs leave it when taken), so the figures from each
 * saved check are read per job rather than folded into one query.
 */
export async function listBoard(db: DbOrTx, sort: BoardSort): Promise<BoardView> {
  const yard = await loadYard(db);
  const rows = await db
    .select({ request: requests, releasedAt: jobs.releasedAt, jurisdictionName: jurisdictions.name })
    .from(requests)
    .leftJoin(jobs, eq(jobs.requestId, requests.id))
    .leftJoin(jurisdictions, eq(jurisdictions.id, requests.jurisdictionId))
    .where(and(eq(requests.status, 'released'), isNull(requests.crewId)))
    .orderBy(asc(requests.statusChangedAt))
    .limit(500);
  const list: BoardJob[] = [];
  for (const { request: r, releasedAt, jurisdictionName } of rows) {
    const check = await loadJobCheck(db, r.id);
    const site = siteCoordinates(r);
    list.push({
      requestId: r.id,
      reference: r.reference,
      version: r.version,
      siteAddress: r.siteAddress,
      roadName: r.roadName,
      jurisdictionName: jurisdictionName ?? check?.ruleProfile.jurisdictionName ?? null,
      permit: permitOf(r),
      check: check ? { summary: check.summary, passed: check.passed } : null,
      earthwork: earthworkEstimate(check),
      wanted: wantedFrom(r.application, r.submittedAt),
      releasedAt: (releasedAt ?? r.statusChangedAt).toISOString(),
      distanceMiles: distanceFromYard(yard, site.lat, site.lng),
    });
  }
  list.sort(sort === 'distance' ? byDistance : byDate);
  return { sort, yard, jobs: list };
}
