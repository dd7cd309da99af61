import { and, eq, sql } from 'drizzle-orm';
import { proposeProfile, ruleProfileSchema, type ProfilePoint, type RuleProfile } from '../../../shared/engine';
import type { SubmittedApplication } from '../../../shared/requests/application-schema';
import type { RequestStatus } from '../../../shared/workflow/statuses';
import { plainSummary } from '../../services/grade-checks/plain-summary';
import { parseGradeCheckInputs, runGradeCheck } from '../../services/grade-checks/run-grade-check';
import { nextReference } from '../../services/requests/reference';
import type { Db } from '../client';
import { gradeChecks, jobs, jurisdictions, requestEvents, requests, ruleProfileVersions, users } from '../schema';

const address = '57 Juniper Ridge Road, Marrow Crossing';

// Surveyed ground at the invented site: 5.5% up from the road edge, too steep for the county's 4% landing.
const ground: ProfilePoint[] = [
  { stationFt: 0, elevationFt: 100 }, { stationFt: 10, elevationFt: 100.55 }, { stationFt: 20, elevationFt: 101.1 },
  { stationFt: 40, elevationFt: 103.4 }, { stationFt: 60, elevationFt: 105.7 }, { stationFt: 80, elevationFt: 108 },
];

const application: SubmittedApplication = {
  site: {
    address, parcelNumber: '12-207-31', roadName: 'Old Quarry Road', roadOwner: 'county', postedSpeedMph: 40,
    positionKind: 'landmark', landmark: 'the stone wall corner', distanceFromLandmarkFt: 140, siteLat: 44.2106, siteLng: -72.5874,
  },
  entrance: {
    work: 'new', use: 'home', vehicles: ['cars', 'trucks'], drivewayLengthFt: 160, riseToHouseFt: 14,
    existingDrainage: 'ditch', timing: 'within_3_months', notes: 'Leave the two sugar maples by the wall.',
  },
};

const grade = (points: ProfilePoint[], from: number, to: number) => {
  const a = points.find((p) => p.stationFt === from)!;
  const b = points.find((p) => p.stationFt === to)!;
  return Math.round(((b.elevationFt - a.elevationFt) / (to - from)) * 10_000) / 100;
};

function checkInputs(rules: RuleProfile) {
  const proposal = proposeProfile({ existing: ground, roadEdgeElevationFt: 100 }, rules);
  const design = proposal.feasible ? proposal.profile : ground;
  const landingGrade = grade(design, 0, 20);
  return {
    profile: { kind: 'elevations', points: design }, roadEdgeStationFt: 0,
    culvert: { diameterIn: 18, manningN: 0.024, inletInvertFt: 97.3, outletInvertFt: 97.0, surfaceElevationFt: 100, topWidthFt: 12, sideSlopeHPerV: 2, designFlowCfs: 6 },
    sight: { speedMph: 40, measuredLeftFt: 620, measuredRightFt: 580 },
    geometry: { widthFt: 12 },
    road: { gradePercent: 1.2, edgeElevationFt: 100 },
    laser: {
      originElevationFt: 100, roadGradePercent: 1.2, landingGradePercent: landingGrade, landingLengthFt: 20,
      drivewayGradePercent: grade(design, 20, 40), receiverOffsetFt: 6,
      stakes: [
        { label: 'Landing left', offsetFt: -6, distanceFt: 10, rodReadingFt: 5.55 },
        { label: 'Landing end', offsetFt: 0, distanceFt: 20, rodReadingFt: 5.9 },
      ],
    },
    design: { existing: ground, roadEdgeElevationFt: 100, applied: proposal.feasible, haul: { soil: 'loam', truckCuYd: 10 } },
  };
}

const path: RequestStatus[] = ['draft', 'submitted', 'visit_booked', 'checked', 'permit_filed', 'permit_granted', 'released'];

/**
 * One demo job waiting on the crew board, released through every step with a saved, attached grade check, so a
 * fresh start shows the crew side at once. Left alone when it is already there (in any status).
 */
export async function seedDemoJobs(db: Db) {
  await db.transaction(async (tx) => {
    const [existing] = await tx.select({ id: requests.id }).from(requests).where(eq(requests.siteAddress, address));
    if (existing) return;
    const [owner] = await tx.select().from(users).where(sql`lower(${users.email}) = 'ravi.castellanos@example.test'`);
    const [office] = await tx.select().from(users).where(and(eq(users.role, 'staff'), eq(users.disabled, false))).limit(1);
    const [county] = await tx.select({ j: jurisdictions, v: ruleProfileVersions }).from(jurisdictions)
      .innerJoin(ruleProfileVersions, eq(ruleProfileVersions.id, jurisdictions.currentVersionId))
      .where(eq(jurisdictions.slug, 'marrow-county'));
    if (!owner || !office || !county) return;
    const rules = { ...ruleProfileSchema.parse(county.v.profile), id: county.v.id, version: county.v.version, jurisdictionName: county.j.name };
    const inputs = parseGradeCheckInputs(checkInputs(rules));
    const results = runGradeCheck(inputs, rules);
    const now = Date.now();
    const day = (offset: number) => new Date(now + offset * 86_400_000);
    const [request] = await tx.insert(requests).values({
      reference: await nextReference(tx), applicantId: owner.id, status: 'released', version: path.length, application, wizardStep: 3,
      applicantName: owner.name, siteAddress: address, roadName: application.site.roadName, siteLat: 44.2106, siteLng: -72.5874,
      jurisdictionId: county.j.id, visitAt: day(-20), submittedAt: day(-30), permitReference: 'MC-DA-2026-0388',
      permitDecidedOn: day(-3).toISOString().slice(0, 10), permitExpiresOn: day(362).toISOString().slice(0, 10),
      permitConditions: 'Traffic control on Old Quarry Road while working in the right-of-way; county inspection of the culvert before backfill.',
    }).returning();
    for (let i = 1; i < path.length; i++) {
      await tx.insert(requestEvents).values({
        requestId: request.id, actorId: i === 1 ? owner.id : office.id, fromStatus: path[i - 1], toStatus: path[i], createdAt: day(-30 + i * 4),
      });
    }
    const [check] = await tx.insert(gradeChecks).values({
      requestId: request.id, number: 1, ruleProfileVersionId: county.v.id, engineVersion: results.report.engineVersion, inputs, results,
      passed: results.report.passes, summary: plainSummary(inputs, results, rules), attachedAt: day(-15), createdById: office.id,
    }).returning();
    await tx.insert(jobs).values({ requestId: request.id, gradeCheckId: check.id, releasedAt: day(-1) });
  });
}
