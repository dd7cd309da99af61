import { and, eq, sql } from 'drizzle-orm';
import { ruleProfileSchema, type ProfilePoint } from '@shared/engine';
import type { SubmittedApplication } from '@shared/requests/application-schema';
import type { RequestStatus } from '@shared/workflow/statuses';
import { nextReference } from '../../services/requests/reference';
import type { Db } from '../../db/client';
import { gradeChecks, jobs, jurisdictions, requestEvents, requests, ruleProfileVersions, users } from '../../db/schema';
import { demoCheck, type DemoSite } from './demo-survey';

const address = '57 Juniper Ridge Road, Marrow Crossing';

// Surveyed ground at the invented site: 5.5% up from the road edge, too steep for the county's 4% landing.
const ground: ProfilePoint[] = [
  { stationFt: 0, elevationFt: 100 },
  { stationFt: 10, elevationFt: 100.55 },
  { stationFt: 20, elevationFt: 101.1 },
  { stationFt: 40, elevationFt: 103.4 },
  { stationFt: 60, elevationFt: 105.7 },
  { stationFt: 80, elevationFt: 108 },
];

const application: SubmittedApplication = {
  site: {
    address,
    parcelNumber: '12-207-31',
    roadName: 'Old Quarry Road',
    roadOwner: 'county',
    postedSpeedMph: 40,
    positionKind: 'landmark',
    landmark: 'the stone wall corner',
    distanceFromLandmarkFt: 140,
    siteLat: 44.2106,
    siteLng: -72.5874,
  },
  entrance: {
    work: 'new',
    use: 'home',
    vehicles: ['cars', 'trucks'],
    drivewayLengthFt: 160,
    riseToHouseFt: 14,
    existingDrainage: 'ditch',
    timing: 'within_3_months',
    notes: 'Leave the two sugar maples by the wall.',
  },
};

// 5.5% up from the road edge for the first 20 ft, then about 11.5%: the county's 4% landing fails until redesigned.
const site: DemoSite = { ground, speedMph: 40, sightLeftFt: 620, sightRightFt: 580, roadGradePercent: 1.2 };

const path: RequestStatus[] = [
  'draft',
  'submitted',
  'visit_booked',
  'checked',
  'permit_filed',
  'permit_granted',
  'released',
];

/**
 * One demo job waiting on the crew board, released through every step with a saved, attached grade check, so a
 * fresh start shows the crew side at once. Left alone when it is already there (in any status).
 */
export async function seedDemoJobs(db: Db) {
  await db.transaction(async (tx) => {
    const [existing] = await tx.select({ id: requests.id }).from(requests).where(eq(requests.siteAddress, address));
    if (existing) return;
    const [owner] = await tx
      .select()
      .from(users)
      .where(sql`lower(${users.email}) = 'ravi.castellanos@example.test'`);
    const [office] = await tx
      .select()
      .from(users)
      .where(and(eq(users.role, 'staff'), eq(users.disabled, false)))
      .limit(1);
    const [county] = await tx
      .select({ j: jurisdictions, v: ruleProfileVersions })
      .from(jurisdictions)
      .innerJoin(ruleProfileVersions, eq(ruleProfileVersions.id, jurisdictions.currentVersionId))
      .where(eq(jurisdictions.slug, 'marrow-county'));
    if (!owner || !office || !county) return;
    const rules = {
      ...ruleProfileSchema.parse(county.v.profile),
      id: county.v.id,
      version: county.v.version,
      jurisdictionName: county.j.name,
    };
    const computed = await demoCheck(rules, site);
    const now = Date.now();
    const day = (offset: number) => new Date(now + offset * 86_400_000);
    const [request] = await tx
      .insert(requests)
      .values({
        reference: await nextReference(tx),
        applicantId: owner.id,
        status: 'released',
        version: path.length,
        statusChangedAt: day(-30 + (path.length - 1) * 4),
        application,
        wizardStep: 3,
        applicantName: owner.name,
        siteAddress: address,
        roadName: application.site.roadName,
        siteLat: 44.2106,
        siteLng: -72.5874,
        jurisdictionId: county.j.id,
        visitAt: day(-20),
        submittedAt: day(-30),
        permitReference: 'MC-DA-2026-0388',
        permitDecidedOn: day(-3).toISOString().slice(0, 10),
        permitExpiresOn: day(362).toISOString().slice(0, 10),
        permitConditions:
          'Traffic control on Old Quarry Road while working in the right-of-way; county inspection of the culvert before backfill.',
      })
      .returning();
    for (let i = 1; i < path.length; i++) {
      await tx.insert(requestEvents).values({
        requestId: request.id,
        actorId: i === 1 ? owner.id : office.id,
        fromStatus: path[i - 1],
        toStatus: path[i],
        createdAt: day(-30 + i * 4),
      });
    }
    const [check] = await tx
      .insert(gradeChecks)
      .values({
        requestId: request.id,
        number: 1,
        ruleProfileVersionId: county.v.id,
        ...computed,
        createdAt: day(-15),
        attachedAt: day(-15),
        createdById: office.id,
      })
      .returning();
    await tx
      .insert(jobs)
      .values({ requestId: request.id, gradeCheckId: check.id, releasedAt: day(-30 + (path.length - 1) * 4) });
  });
}
