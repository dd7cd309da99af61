import { z } from 'zod';
import { parseInput } from './errors';
import { bounded, elevationFt, gradePercent, nonNegative } from './numbers';

const offsetFt = () => bounded(-1_000, 1_000);

export const laserSetupInputSchema = z.object({
  // Design elevation at the road edge on the centreline: the origin of both axes.
  originElevationFt: elevationFt(),
  // Road grade measured along the road, + rising to the crew's right when facing into the property.
  roadGradePercent: gradePercent(),
  // + rises away from the road.
  landingGradePercent: gradePercent(),
  landingLengthFt: nonNegative(1_000),
  drivewayGradePercent: gradePercent(),
  // Cross slope for the second setup, same sign as the road grade; 0 keeps the driveway level across.
  drivewayCrossSlopePercent: gradePercent().default(0),
  // Compass bearing of the centreline heading into the property; without it bearings are from the centreline.
  drivewayBearingDeg: bounded(0, 360).default(0),
  // Rod reading at which the receiver shows on-grade: the beam's height above design grade.
  receiverOffsetFt: bounded(0, 50),
  stakes: z
    .array(z.object({ label: z.string().max(40), offsetFt: offsetFt(), distanceFt: bounded(-100, 5_000), rodReadingFt: bounded(-50, 100) }))
    .max(500)
    .default([]),
});
export type LaserSetupInput = z.input<typeof laserSetupInputSchema>;

export interface PlaneSetting {
  alongRoadPercent: number;
  alongDrivewayPercent: number;
  steepestPercent: number;
  steepestBearingDeg: number;
  /** The same settings said the way a crew reads them. */
  description: string;
  originDistanceFt: number;
  originElevationFt: number;
}

export interface StakeResult {
  label: string;
  setup: 'first' | 'second';
  designElevationFt: number;
  /** + cut (ground above grade), - fill. */
  cutFillFt: number;
  instruction: string;
}

const words = (percent: number, rising: string, falling: string) =>
  percent === 0 ? 'level' : `${Math.abs(percent)}% ${percent > 0 ? rising : falling}`;

function plane(gx: number, gy: number, bearing: number, originDistanceFt: number, originElevationFt: number): PlaneSetting {
  const steepestPercent = Math.hypot(gx, gy);
  // Steepest rise, clockwise from the heading into the property (right of it is clockwise seen from above).
  const relative = steepestPercent === 0 ? 0 : (Math.atan2(gx, gy) * 180) / Math.PI;
  const steepestBearingDeg = (((bearing + relative) % 360) + 360) % 360;
  const description =
    `Along the road: ${words(gx, 'rising to the right', 'falling to the right')} (facing into the property). ` +
    `Along the driveway: ${words(gy, 'rising away from the road', 'falling away from the road')}.`;
  return { alongRoadPercent: gx, alongDrivewayPercent: gy, steepestPercent, steepestBearingDeg, description, originDistanceFt, originElevationFt };
}

const elevationOn = (s: PlaneSetting, offset: number, distance: number) =>
  s.originElevationFt + (s.alongRoadPercent / 100) * offset + (s.alongDrivewayPercent / 100) * (distance - s.originDistanceFt);

/**
 * The apron as a plane matched to the road along one axis and to the landing along the other; the second
 * setup starts where the landing ends and carries the driveway grade.
 */
export function laserSetup(input: LaserSetupInput) {
  const p = parseInput(laserSetupInputSchema, input);
  const first = plane(p.roadGradePercent, p.landingGradePercent, p.drivewayBearingDeg, 0, p.originElevationFt);
  const landingEndElevation = p.originElevationFt + (p.landingGradePercent / 100) * p.landingLengthFt;
  const secondSetup = plane(p.drivewayCrossSlopePercent, p.drivewayGradePercent, p.drivewayBearingDeg, p.landingLengthFt, landingEndElevation);
  const stakes: StakeResult[] = p.stakes.map((s) => {
    const setup = s.distanceFt <= p.landingLengthFt ? 'first' : 'second';
    const designElevationFt = elevationOn(setup === 'first' ? first : secondSetup, s.offsetFt, s.distanceFt);
    // The beam rides receiverOffset above grade, so a shorter reading means the ground stands above grade.
    const cutFillFt = Math.round((p.receiverOffsetFt - s.rodReadingFt) * 1e9) / 1e9;
    const amount = Math.abs(cutFillFt).toFixed(2);
    const instruction = cutFillFt > 0 ? `cut ${amount} ft` : cutFillFt < 0 ? `fill ${amount} ft` : 'on grade';
    return { label: s.label, setup, designElevationFt, cutFillFt, instruction };
  });
  return { ...first, description: first.description, stakes, secondSetup };
}
