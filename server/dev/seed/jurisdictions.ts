import { eq } from 'drizzle-orm';
import { passengerCarPreset, ruleProfileSchema, type RuleProfileInput } from '@shared/engine';
import type { DbOrTx } from '../../db/client';
import { jurisdictions, ruleProfileVersions } from '../../db/schema';

interface DemoJurisdiction {
  slug: string;
  name: string;
  authority: string;
  profile: RuleProfileInput;
}

/**
 * Two invented road authorities whose rules differ where it matters: a landing surveyed at 5% passes the town's
 * 6% limit and fails the county's 4%. Every value carries the (invented) clause it comes from.
 */
const marrow: DemoJurisdiction = {
  slug: 'marrow-county',
  name: 'Marrow County',
  authority: 'Marrow County Highway Department',
  profile: {
    name: 'Marrow County driveway access rules',
    units: 'us',
    landing: { lengthFt: 20, minGradePercent: -2, maxGradePercent: 4 },
    maxGradePercent: 15,
    minDrainageGradePercent: 0.5,
    maxGradeChangePercent: 11,
    designVehicle: passengerCarPreset,
    culvert: { minDiameterIn: 15, minCoverIn: 12, minLengthFt: 24, lengthIncrementFt: 2, maxHeadwaterToDiameter: 1.5 },
    sight: { basis: 'intersection', designSpeedMph: 45, vehicle: 'passenger' },
    geometry: {
      minWidthFt: 12,
      maxWidthFt: 24,
      minFlareRadiusFt: 10,
      minDistanceToIntersectionFt: 100,
      minDistanceToPropertyLineFt: 5,
    },
    asBuilt: { gradeTolerancePercent: 0.5, elevationToleranceFt: 0.1 },
    sources: {
      'landing.lengthFt':
        'Marrow County Driveway Access Standards (2019), sec. 3.2: landing of 20 ft from the edge of pavement',
      'landing.minGradePercent': 'Access Standards sec. 3.2: the landing may fall toward the road no more than 2%',
      'landing.maxGradePercent': 'Access Standards sec. 3.2: the landing may rise no more than 4%',
      maxGradePercent: 'Access Standards sec. 3.4: 15% maximum driveway grade',
      minDrainageGradePercent: 'Access Standards sec. 3.4: 0.5% minimum so water leaves the driveway',
      maxGradeChangePercent: 'Access Standards sec. 3.5: 11% maximum algebraic difference at a grade break',
      designVehicle: 'Highway Department practice: passenger car',
      'culvert.minDiameterIn': 'Access Standards sec. 5.1: 15 in minimum pipe under an entrance',
      'culvert.minCoverIn': 'Access Standards sec. 5.2: 12 in minimum cover over the pipe',
      'culvert.minLengthFt': 'Access Standards sec. 5.1: 24 ft minimum pipe length',
      'culvert.lengthIncrementFt': 'Pipe sold in 2 ft increments (supplier practice)',
      'culvert.maxHeadwaterToDiameter': 'Drainage Manual ch. 4: headwater no more than 1.5 diameters',
      'sight.basis': 'Access Standards sec. 4.1: intersection sight distance',
      'sight.designSpeedMph': 'Access Standards sec. 4.1: 45 mph where no speed is posted',
      'sight.vehicle': 'Access Standards sec. 4.1: passenger car leaving the driveway',
      'geometry.minWidthFt': 'Access Standards sec. 2.3: 12 ft minimum width',
      'geometry.maxWidthFt': 'Access Standards sec. 2.3: 24 ft maximum width for a residence',
      'geometry.minFlareRadiusFt': 'Access Standards sec. 2.4: 10 ft minimum return radius',
      'geometry.minDistanceToIntersectionFt': 'Access Standards sec. 2.6: 100 ft from the nearest intersection',
      'geometry.minDistanceToPropertyLineFt': 'Access Standards sec. 2.6: 5 ft from the side property line',
      'asBuilt.gradeTolerancePercent': 'Inspection checklist: grades within 0.5%',
      'asBuilt.elevationToleranceFt': 'Inspection checklist: elevations within 0.1 ft',
    },
  },
};

const elderbrook: DemoJurisdiction = {
  slug: 'town-of-elderbrook',
  name: 'Town of Elderbrook',
  authority: 'Elderbrook Public Works',
  profile: {
    name: 'Elderbrook driveway permit rules',
    units: 'us',
    landing: { lengthFt: 15, minGradePercent: -6, maxGradePercent: 6 },
    maxGradePercent: 18,
    maxGradeChangePercent: 14,
    designVehicle: passengerCarPreset,
    culvert: { minDiameterIn: 12, minCoverIn: 9, lengthIncrementFt: 2, maxHeadwaterToDiameter: 2 },
    sight: { basis: 'stopping', designSpeedMph: 30, vehicle: 'passenger' },
    geometry: {
      minWidthFt: 10,
      maxWidthFt: 30,
      minFlareRadiusFt: 5,
      minDistanceToIntersectionFt: 50,
      minDistanceToPropertyLineFt: 3,
    },
    asBuilt: { gradeTolerancePercent: 1, elevationToleranceFt: 0.15 },
    sources: {
      'landing.lengthFt': 'Town Code ch. 212, sec. 7(b): 15 ft landing',
      'landing.minGradePercent': 'Town Code sec. 7(b): landing within 6% either way',
      'landing.maxGradePercent': 'Town Code sec. 7(b): landing within 6% either way',
      maxGradePercent: 'Town Code sec. 7(c): 18% maximum grade',
      maxGradeChangePercent: 'Public Works detail D-4: 14% maximum grade change',
      designVehicle: 'Public Works practice: passenger car',
      'culvert.minDiameterIn': 'Public Works detail D-6: 12 in minimum culvert',
      'culvert.minCoverIn': 'Public Works detail D-6: 9 in minimum cover',
      'culvert.lengthIncrementFt': 'Pipe sold in 2 ft increments (supplier practice)',
      'culvert.maxHeadwaterToDiameter': 'Public Works detail D-6: headwater up to 2 diameters',
      'sight.basis': 'Town Code sec. 7(e): stopping sight distance on town roads',
      'sight.designSpeedMph': 'Town Code sec. 7(e): 30 mph town-road speed',
      'sight.vehicle': 'Town Code sec. 7(e): passenger car',
      'geometry.minWidthFt': 'Town Code sec. 7(a): 10 ft minimum width',
      'geometry.maxWidthFt': 'Town Code sec. 7(a): 30 ft maximum width',
      'geometry.minFlareRadiusFt': 'Public Works detail D-2: 5 ft flare',
      'geometry.minDistanceToIntersectionFt': 'Town Code sec. 7(d): 50 ft from an intersection',
      'geometry.minDistanceToPropertyLineFt': 'Town Code sec. 7(d): 3 ft from the side line',
      'asBuilt.gradeTolerancePercent': 'Public Works final inspection: grades within 1%',
      'asBuilt.elevationToleranceFt': 'Public Works final inspection: elevations within 0.15 ft',
    },
  },
};

export const demoJurisdictions = [marrow, elderbrook];

/** Creates each demo authority with a published version 1 unless its slug already exists. */
export async function seedJurisdictions(db: DbOrTx) {
  for (const j of demoJurisdictions) {
    const [found] = await db.select({ id: jurisdictions.id }).from(jurisdictions).where(eq(jurisdictions.slug, j.slug));
    if (found) continue;
    const [row] = await db
      .insert(jurisdictions)
      .values({ slug: j.slug, name: j.name, authority: j.authority })
      .returning();
    const [version] = await db
      .insert(ruleProfileVersions)
      .values({
        jurisdictionId: row.id,
        version: 1,
        status: 'published',
        profile: {},
        changeNote: 'First published rules (demo authority)',
        publishedAt: new Date(),
      })
      .returning();
    const profile = { ...ruleProfileSchema.parse(j.profile), id: version.id, version: 1, jurisdictionName: j.name };
    await db.update(ruleProfileVersions).set({ profile }).where(eq(ruleProfileVersions.id, version.id));
    await db.update(jurisdictions).set({ currentVersionId: version.id }).where(eq(jurisdictions.id, row.id));
  }
}
