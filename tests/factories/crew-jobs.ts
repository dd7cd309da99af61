import { eq } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import {
  checkEntrance,
  ENGINE_VERSION,
  laserSetup,
  proposeProfile,
  type LaserSetupInput,
  type RuleProfile,
} from '@shared/engine';
import type { DbOrTx } from '../../server/db/client';
import { gradeChecks, jobs, jurisdictions, requests, ruleProfileVersions } from '../../server/db/schema';
import { completeApplication, createRequestRow, type RequestRow } from './request-rows';

/** An invented township's limits: the usual 4% landing for 20 ft, 15% beyond, half a percent as-built tolerance. */
export const harlowRules: RuleProfile = {
  name: 'Harlow Township driveway standard',
  units: 'us',
  landing: { lengthFt: 20, minGradePercent: -4, maxGradePercent: 4 },
  maxGradePercent: 15,
  maxGradeChangePercent: 12,
  designVehicle: { name: 'Passenger car', wheelbaseFt: 11, frontOverhangFt: 3, rearOverhangFt: 5, clearanceIn: 5 },
  culvert: { minDiameterIn: 15, minCoverIn: 12, lengthIncrementFt: 2 },
  sight: { basis: 'intersection', vehicle: 'passenger', gradeReading: 'above-3-percent' },
  geometry: {},
  asBuilt: { gradeTolerancePercent: 0.5, elevationToleranceFt: 0.1 },
  sources: { 'landing.maxGradePercent': 'Harlow Township road ordinance (invented for the demo)' },
};

/** Ground as surveyed at the invented site: steep near the road, which the proposal flattens. */
const existing = [
  { stationFt: 0, elevationFt: 100 },
  { stationFt: 10, elevationFt: 100.9 },
  { stationFt: 20, elevationFt: 101.6 },
  { stationFt: 40, elevationFt: 103.8 },
  { stationFt: 60, elevationFt: 106.1 },
  { stationFt: 80, elevationFt: 108.2 },
];
const design = [
  { stationFt: 0, elevationFt: 100 },
  { stationFt: 20, elevationFt: 100.5 },
  { stationFt: 40, elevationFt: 102.5 },
  { stationFt: 60, elevationFt: 105.3 },
  { stationFt: 80, elevationFt: 108.2 },
];
const laser: LaserSetupInput = {
  originElevationFt: 100,
  roadGradePercent: -1.2,
  landingGradePercent: 2.5,
  landingLengthFt: 20,
  drivewayGradePercent: 12,
  receiverOffsetFt: 5,
  stakes: [
    { label: 'A left', offsetFt: -6, distanceFt: 10, rodReadingFt: 4.62 },
    { label: 'B right', offsetFt: 6, distanceFt: 20, rodReadingFt: 5.3 },
    { label: 'C', offsetFt: 0, distanceFt: 60, rodReadingFt: 4.1 },
  ],
};
const culvert = {
  diameterIn: 18,
  manningN: 0.024,
  inletInvertFt: 97.4,
  outletInvertFt: 97.1,
  surfaceElevationFt: 100,
  topWidthFt: 14,
  sideSlopeHPerV: 2,
};

export async function createHarlowProfile(db: DbOrTx, rules: RuleProfile = harlowRules) {
  const tag = randomUUID().slice(0, 6);
  const [jurisdiction] = await db
    .insert(jurisdictions)
    .values({ slug: `harlow-${tag}`, name: `Harlow Township ${tag}`, authority: 'Harlow Township Highway Department' })
    .returning();
  const [version] = await db
    .insert(ruleProfileVersions)
    .values({
      jurisdictionId: jurisdiction.id,
      version: 3,
      status: 'published',
      profile: rules,
      publishedAt: new Date(),
    })
    .returning();
  return {
    jurisdiction,
    version,
    stamped: { ...rules, id: version.id, version: 3, jurisdictionName: jurisdiction.name } as RuleProfile,
  };
}

/** A saved check shaped as the office's check screen stores it: the engine's inputs and results. */
export async function createCrewCheck(
  db: DbOrTx,
  requestId: string,
  createdById: string,
  rules: RuleProfile = harlowRules,
) {
  const { jurisdiction, version, stamped } = await createHarlowProfile(db, rules);
  const designPart = { existing, roadEdgeElevationFt: 100, applied: false };
  const inputs = { profile: design, roadEdgeStationFt: 0, culvert, laser, design: designPart };
  const report = checkEntrance({ profile: design, roadEdgeStationFt: 0, culvert }, stamped);
  const results = {
    report,
    laser: laserSetup(laser),
    proposal: await proposeProfile({ existing, roadEdgeElevationFt: 100 }, stamped),
  };
  const [check] = await db
    .insert(gradeChecks)
    .values({
      requestId,
      number: 1,
      ruleProfileVersionId: version.id,
      engineVersion: ENGINE_VERSION,
      inputs,
      results,
      passed: report.passes,
      summary: report.summary.text,
      attachedAt: new Date(),
      createdById,
    })
    .returning();
  return { check, jurisdiction, version, rules: stamped };
}

export interface ReleasedJobOptions {
  applicantId: string;
  staffId: string;
  siteLat?: number | null;
  siteLng?: number | null;
  timing?: 'soon' | 'within_3_months' | 'this_year' | 'flexible';
  submittedAt?: Date;
  permitExpiresOn?: string;
  rules?: RuleProfile;
}

/** A request on the board: permit granted, released with its check, exactly as the release step leaves it. */
export async function createReleasedJob(
  db: DbOrTx,
  o: ReleasedJobOptions,
): Promise<RequestRow & { gradeCheckId: string }> {
  const application = completeApplication();
  application.entrance.timing = o.timing ?? 'within_3_months';
  application.entrance.notes = 'Gate code 4417; park on the gravel pad, not the lawn.';
  const row = await createRequestRow(db, {
    applicantId: o.applicantId,
    status: 'released',
    application,
    submittedAt: o.submittedAt ?? new Date('2026-11-02T15:00:00Z'),
    siteLat: o.siteLat ?? null,
    siteLng: o.siteLng ?? null,
    permitReference: `HT-ACC-${randomUUID().slice(0, 4)}`,
    permitDecidedOn: '2026-11-20',
    permitConditions: 'Culvert 18 in minimum; township inspection before paving.',
    permitExpiresOn: o.permitExpiresOn ?? '2027-11-20',
  });
  const { check, jurisdiction } = await createCrewCheck(db, row.id, o.staffId, o.rules);
  const [updated] = await db.update(requests).set({ jurisdictionId: jurisdiction.id }).where(eqId(row.id)).returning();
  await db.update(jobs).set({ gradeCheckId: check.id }).where(eq(jobs.requestId, row.id));
  return { ...updated, gradeCheckId: check.id };
}

const eqId = (id: string) => eq(requests.id, id);
