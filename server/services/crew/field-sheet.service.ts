import { eq } from 'drizzle-orm';
import { elevationAt, type CutFillAtStation } from '@shared/engine';
import { buildChartInputFor } from '@shared/charts/chart-input';
import { planInputFor } from '@shared/charts/plan-input';
import { headwaterWords } from '@shared/charts/check-words';
import { roadOwnerText } from '@shared/requests/choices';
import { crewStages } from '@shared/workflow/statuses';
import type { CulvertSheet, FieldSheetView, LaserSheet } from '@shared/crew/crew-views';
import type { SessionUser } from '../../lib/session-user';
import type { Db } from '../../db/client';
import { jobs, jurisdictions, users } from '../../db/schema';
import { notFound } from '../../lib/errors';
import { loadVisibleRequest, type RequestRow } from '../requests/request-access';
import { permitOf } from './board.service';
import { earthworkEstimate } from './job-facts';
import { loadJobCheck, ruleProfileLabel, type SavedCheck } from './saved-check';

export const fieldCautions = [
  'Call the utility locate line and wait for buried utilities to be marked before any digging; hand-dig near the marks.',
  'Follow trench-safety rules for the culvert trench: slope, bench or shore it, keep spoil back from the edge, never work alone in it.',
  'Set up traffic control for work in the road right-of-way as the permit and the road authority require: signs, cones, a flagger where needed.',
  'The road authority’s inspection prevails: these figures support the crew, they do not replace the inspector, local codes or a licensed engineer.',
];

function laserSheet(check: SavedCheck): LaserSheet | null {
  const { laser, laserInput } = check;
  if (!laser || !laserInput) return null;
  const { stakes, secondSetup, warp, ...first } = laser;
  return {
    first,
    second: secondSetup,
    warp: warp ?? null,
    receiverOffsetFt: laserInput.receiverOffsetFt,
    landingLengthFt: laserInput.landingLengthFt,
    stakes: stakes.map((s, i) => ({
      ...s,
      offsetFt: laserInput.stakes[i]?.offsetFt ?? 0,
      distanceFt: laserInput.stakes[i]?.distanceFt ?? 0,
      rodReadingFt: laserInput.stakes[i]?.rodReadingFt ?? 0,
    })),
  };
}

function culvertSheet(check: SavedCheck): CulvertSheet | null {
  const c = check.culvert;
  if (!c) return null;
  const summary = check.culvertSummary ?? {};
  const lengthFt = c.lengthFt ?? summary.requiredLengthFt ?? null;
  return {
    diameterIn: c.diameterIn,
    lengthFt,
    lengthIsMinimum: c.lengthFt === undefined && lengthFt !== null,
    inletInvertFt: c.inletInvertFt,
    outletInvertFt: c.outletInvertFt,
    coverIn: summary.coverIn ?? null,
    slopePercent: summary.slopeFtPerFt === undefined ? null : summary.slopeFtPerFt * 100,
    headwaterText: headwaterWords(summary),
  };
}

function cutFill(check: SavedCheck): CutFillAtStation[] {
  if (check.design?.applied && check.proposal?.feasible) return check.proposal.cutFillByStation;
  const existing = check.existingPoints;
  if (!existing) return [];
  const [first, last] = [existing[0].stationFt, existing[existing.length - 1].stationFt];
  return check.designPoints
    .filter((p) => p.stationFt >= first && p.stationFt <= last)
    .map((p) => {
      const existingFt = elevationAt(existing, p.stationFt);
      return { stationFt: p.stationFt, existingFt, designFt: p.elevationFt, cutFillFt: existingFt - p.elevationFt };
    });
}

function whereText(site: Record<string, unknown> | undefined): string {
  if (!site) return '';
  if (site.positionKind === 'landmark' && typeof site.landmark === 'string') {
    const ft = typeof site.distanceFromLandmarkFt === 'number' ? `${site.distanceFromLandmarkFt} ft from ` : 'Near ';
    return `${ft}${site.landmark}`;
  }
  if (typeof site.siteLat === 'number' && typeof site.siteLng === 'number')
    return `At ${site.siteLat.toFixed(5)}, ${site.siteLng.toFixed(5)}`;
  return '';
}

async function sheetFor(db: Db, row: RequestRow) {
  const check = await loadJobCheck(db, row.id);
  const [job] = await db.select({ scheduledFor: jobs.scheduledFor }).from(jobs).where(eq(jobs.requestId, row.id));
  const [crew] = row.crewId ? await db.select({ name: users.name }).from(users).where(eq(users.id, row.crewId)) : [];
  const [authority] = row.jurisdictionId
    ? await db
        .select({ name: jurisdictions.name, authority: jurisdictions.authority })
        .from(jurisdictions)
        .where(eq(jurisdictions.id, row.jurisdictionId))
    : [];
  const app = (row.application ?? {}) as { site?: Record<string, unknown>; entrance?: Record<string, unknown> };
  const site = app.site ?? {};
  const owner =
    typeof site.roadOwner === 'string' && site.roadOwner in roadOwnerText
      ? roadOwnerText[site.roadOwner as keyof typeof roadOwnerText]
      : '';
  const rules = check?.ruleProfile;
  return {
    job: {
      requestId: row.id,
      reference: row.reference,
      status: row.status,
      version: row.version,
      siteAddress: row.siteAddress,
      roadName: row.roadName,
      applicantName: row.applicantName,
      crewId: row.crewId,
      crewName: crew?.name ?? null,
      scheduledFor: job?.scheduledFor ?? null,
    },
    access: {
      parcelNumber: typeof site.parcelNumber === 'string' ? site.parcelNumber : '',
      roadOwner: owner,
      postedSpeedMph: typeof site.postedSpeedMph === 'number' ? site.postedSpeedMph : null,
      whereText: whereText(site),
      notes: typeof app.entrance?.notes === 'string' ? app.entrance.notes : '',
      lat: row.siteLat,
      lng: row.siteLng,
    },
    permit: {
      ...permitOf(row),
      authority: authority?.authority ?? null,
      jurisdictionName: authority?.name ?? rules?.jurisdictionName ?? null,
    },
    check: check
      ? {
          number: check.number,
          summary: check.summary,
          passed: check.passed,
          ruleProfileLabel: ruleProfileLabel(check.ruleProfile),
          engineVersion: check.engineVersion,
        }
      : null,
    rules: rules
      ? {
          landingLengthFt: rules.landing.lengthFt,
          landingMinPercent: rules.landing.minGradePercent,
          landingMaxPercent: rules.landing.maxGradePercent,
          maxGradePercent: rules.maxGradePercent,
        }
      : null,
    laser: check ? laserSheet(check) : null,
    culvert: check ? culvertSheet(check) : null,
    apron: check?.apron ?? null,
    design: check
      ? {
          points: check.designPoints,
          existing: check.existingPoints,
          cutFill: cutFill(check),
          chart: buildChartInputFor(check.record.inputs, check.record.results, check.ruleProfile, check.existingPoints),
        }
      : null,
    plan: check ? planInputFor(check.record.inputs, check.record.results.report, { roadName: row.roadName }) : null,
    earthwork: earthworkEstimate(check),
    cautions: fieldCautions,
  } satisfies FieldSheetView;
}

/** Everything the crew takes to site, for the crew that has the job (or any crew while it is on the board) and the office. */
export async function fieldSheet(db: Db, user: SessionUser, requestId: string): Promise<FieldSheetView> {
  const row = await loadVisibleRequest(db, user, requestId);
  if (!crewStages.includes(row.status)) throw notFound('Job');
  return sheetFor(db, row);
}
