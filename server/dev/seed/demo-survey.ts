import { proposeProfile, ruleProfileSchema, type ProfilePoint, type RuleProfile } from '@shared/engine';
import { plainSummary } from '../../services/grade-checks/plain-summary';
import { parseGradeCheckInputs, runGradeCheck } from '../../services/grade-checks/run-grade-check';
import { eq } from 'drizzle-orm';
import { toStoredColumns } from '@shared/grade-check/stored-check';
import type { DbOrTx } from '../../db/client';
import { jurisdictions, ruleProfileVersions } from '../../db/schema';

/** Ground shots along an invented site's centreline, rising `landingRisePercent` and then `drivewayRisePercent`. */
export function demoGround(landingRisePercent: number, drivewayRisePercent: number, lengthFt = 80): ProfilePoint[] {
  const points: ProfilePoint[] = [];
  for (let station = 0; station <= lengthFt; station += station < 20 ? 10 : 20) {
    const rise =
      (Math.min(station, 20) * landingRisePercent) / 100 + (Math.max(station - 20, 0) * drivewayRisePercent) / 100;
    points.push({ stationFt: station, elevationFt: Math.round((100 + rise) * 100) / 100 });
  }
  return points;
}

const gradeBetween = (points: ProfilePoint[], from: number, to: number) => {
  const a = points.find((p) => p.stationFt === from)!;
  const b = points.find((p) => p.stationFt === to)!;
  return Math.round(((b.elevationFt - a.elevationFt) / (to - from)) * 10_000) / 100;
};

export interface DemoSite {
  ground: ProfilePoint[];
  speedMph: number;
  sightLeftFt: number;
  sightRightFt: number;
  roadGradePercent: number;
}

/**
 * The inputs the office's check screen would save for a demo site: the least-earth design applied when the
 * ground fails, a culvert under the entrance, sight lines and the laser setup with two stakes.
 */
export async function demoCheckInputs(rules: RuleProfile, site: DemoSite) {
  const proposal = await proposeProfile({ existing: site.ground, roadEdgeElevationFt: 100 }, rules);
  const design = proposal.feasible ? proposal.profile : site.ground;
  return {
    profile: { kind: 'elevations', points: design },
    roadEdgeStationFt: 0,
    culvert: {
      diameterIn: 18,
      manningN: 0.024,
      inletInvertFt: 97.3,
      outletInvertFt: 97.0,
      surfaceElevationFt: 100,
      topWidthFt: 12,
      sideSlopeHPerV: 2,
      designFlowCfs: 6,
    },
    sight: { speedMph: site.speedMph, measuredLeftFt: site.sightLeftFt, measuredRightFt: site.sightRightFt },
    geometry: { widthFt: 12, flareRadiusFt: 10, distanceToIntersectionFt: 420, distanceToPropertyLineFt: 18 },
    road: { gradePercent: site.roadGradePercent, edgeElevationFt: 100 },
    // What the plan view and the permit packet draw: an invented site's right-of-way, bearing and neighbours.
    plan: {
      rightOfWayFt: 16.5,
      roadWidthFt: 22,
      bearingDeg: 28,
      intersectionSide: 'left',
      intersectionName: 'Hollis Cross Road',
      propertyLineSide: 'right',
      culvertMaterial: 'corrugated plastic',
    },
    laser: {
      originElevationFt: 100,
      roadGradePercent: site.roadGradePercent,
      landingGradePercent: gradeBetween(design, 0, 20),
      landingLengthFt: 20,
      drivewayGradePercent: gradeBetween(design, 20, 40),
      receiverOffsetFt: 6,
      stakes: [
        { label: 'Landing left', offsetFt: -6, distanceFt: 10, rodReadingFt: 5.55 },
        { label: 'Landing end', offsetFt: 0, distanceFt: 20, rodReadingFt: 5.9 },
      ],
    },
    design: {
      existing: site.ground,
      roadEdgeElevationFt: 100,
      applied: proposal.feasible,
      haul: { soil: 'loam', truckCuYd: 10 },
    },
  };
}

/** The current published rule profile of a demo jurisdiction, stamped the way saved checks name it. */
export async function currentRules(tx: DbOrTx, slug: string) {
  const [row] = await tx
    .select({ j: jurisdictions, v: ruleProfileVersions })
    .from(jurisdictions)
    .innerJoin(ruleProfileVersions, eq(ruleProfileVersions.id, jurisdictions.currentVersionId))
    .where(eq(jurisdictions.slug, slug));
  if (!row) return null;
  const rules: RuleProfile = {
    ...ruleProfileSchema.parse(row.v.profile),
    id: row.v.id,
    version: row.v.version,
    jurisdictionName: row.j.name,
  };
  return { jurisdictionId: row.j.id, versionId: row.v.id, rules };
}

/**
 * A saved check's columns, computed by the same server code a real save runs. Seeding is a one-off before the
 * server answers anyone, so its proposals run on this thread rather than in the design pool.
 */
export async function demoCheck(rules: RuleProfile, site: DemoSite) {
  const inputs = parseGradeCheckInputs(await demoCheckInputs(rules, site));
  const results = await runGradeCheck(inputs, rules, proposeProfile);
  return {
    ...toStoredColumns(inputs, results),
    passed: results.report.passes,
    summary: plainSummary(inputs, results, rules),
    engineVersion: results.report.engineVersion,
  };
}
