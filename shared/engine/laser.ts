import { z } from 'zod';
import { EngineInputError, parseInput } from './errors';
import { formatStation } from './station';
import { bounded, elevationFt, gradePercent, nonNegative, positive } from './numbers';

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
  // Cross slope for the second setup, same sign as the road grade. Left out, the driveway keeps the road grade
  // across so the two planes meet along the change line; a different value needs a warp between them.
  drivewayCrossSlopePercent: gradePercent().optional(),
  // Length along the driveway over which the cross slope turns from the road grade to the driveway's.
  warpLengthFt: positive(500).optional(),
  // Compass bearing of the centreline heading into the property; without it bearings are from the centreline.
  drivewayBearingDeg: bounded(0, 360).default(0),
  // Rod reading at which the receiver shows on-grade: the beam's height above design grade.
  receiverOffsetFt: bounded(0, 50),
  stakes: z
    .array(
      z.object({
        label: z.string().max(40),
        offsetFt: offsetFt(),
        distanceFt: bounded(-100, 5_000),
        rodReadingFt: bounded(-50, 100),
      }),
    )
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
  setup: 'first' | 'warp' | 'second';
  designElevationFt: number;
  /** + cut (ground above grade), - fill. */
  cutFillFt: number;
  instruction: string;
}

const words = (percent: number, rising: string, falling: string) =>
  percent === 0 ? 'level' : `${Math.abs(percent)}% ${percent > 0 ? rising : falling}`;

function plane(
  gx: number,
  gy: number,
  bearing: number,
  originDistanceFt: number,
  originElevationFt: number,
): PlaneSetting {
  const steepestPercent = Math.hypot(gx, gy);
  // Steepest rise, clockwise from the heading into the property (right of it is clockwise seen from above).
  const relative = steepestPercent === 0 ? 0 : (Math.atan2(gx, gy) * 180) / Math.PI;
  const steepestBearingDeg = (((bearing + relative) % 360) + 360) % 360;
  const description =
    `Along the road: ${words(gx, 'rising to the right', 'falling to the right')} (facing into the property). ` +
    `Along the driveway: ${words(gy, 'rising away from the road', 'falling away from the road')}.`;
  return {
    alongRoadPercent: gx,
    alongDrivewayPercent: gy,
    steepestPercent,
    steepestBearingDeg,
    description,
    originDistanceFt,
    originElevationFt,
  };
}

/** Between the setups: the cross slope turns linearly from the first plane's to the second's, so it meets both. */
export interface LaserWarp {
  fromDistanceFt: number;
  toDistanceFt: number;
  fromCrossSlopePercent: number;
  toCrossSlopePercent: number;
  /** Centreline design elevation where the warp starts, and the driveway grade it carries. */
  startElevationFt: number;
  alongDrivewayPercent: number;
  description: string;
}

const elevationOn = (s: PlaneSetting, offset: number, distance: number) =>
  s.originElevationFt +
  (s.alongRoadPercent / 100) * offset +
  (s.alongDrivewayPercent / 100) * (distance - s.originDistanceFt);

function elevationOnWarp(w: LaserWarp, offset: number, distance: number): number {
  const f = (distance - w.fromDistanceFt) / (w.toDistanceFt - w.fromDistanceFt);
  const cross = w.fromCrossSlopePercent + f * (w.toCrossSlopePercent - w.fromCrossSlopePercent);
  return w.startElevationFt + (w.alongDrivewayPercent / 100) * (distance - w.fromDistanceFt) + (cross / 100) * offset;
}

const slopeWords = (percent: number) => words(percent, 'rising to the right', 'falling to the right');

function warpOf(p: z.output<typeof laserSetupInputSchema>, landingEndElevation: number): LaserWarp | null {
  const cross = p.drivewayCrossSlopePercent;
  if (cross === undefined || Math.abs(cross - p.roadGradePercent) < 1e-9) return null;
  if (p.warpLengthFt === undefined) {
    throw new EngineInputError(
      'warpLengthFt',
      `the driveway cross slope (${cross}%) differs from the road grade (${p.roadGradePercent}%), so the two setups meet only through a warp: give its length`,
    );
  }
  const to = p.landingLengthFt + p.warpLengthFt;
  return {
    fromDistanceFt: p.landingLengthFt,
    toDistanceFt: to,
    fromCrossSlopePercent: p.roadGradePercent,
    toCrossSlopePercent: cross,
    startElevationFt: landingEndElevation,
    alongDrivewayPercent: p.drivewayGradePercent,
    description: `Warp from ${formatStation(p.landingLengthFt)} to ${formatStation(to)}, set from stakes: the cross slope turns from ${slopeWords(p.roadGradePercent)} to ${slopeWords(cross)}.`,
  };
}

/**
 * The apron as a plane matched to the road along one axis and to the landing along the other. The second setup
 * carries the driveway grade from where the landing ends, tilted across like the first so the two planes share
 * the change line; where the driveway is to be tilted differently, a warp set from stakes joins them.
 */
export function laserSetup(input: LaserSetupInput) {
  const p = parseInput(laserSetupInputSchema, input);
  const first = plane(p.roadGradePercent, p.landingGradePercent, p.drivewayBearingDeg, 0, p.originElevationFt);
  const landingEndElevation = p.originElevationFt + (p.landingGradePercent / 100) * p.landingLengthFt;
  const warp = warpOf(p, landingEndElevation);
  const secondSetup = warp
    ? plane(
        warp.toCrossSlopePercent,
        p.drivewayGradePercent,
        p.drivewayBearingDeg,
        warp.toDistanceFt,
        elevationOnWarp(warp, 0, warp.toDistanceFt),
      )
    : plane(p.roadGradePercent, p.drivewayGradePercent, p.drivewayBearingDeg, p.landingLengthFt, landingEndElevation);
  const stakes: StakeResult[] = p.stakes.map((s) => {
    const setup =
      s.distanceFt <= p.landingLengthFt ? 'first' : warp && s.distanceFt < warp.toDistanceFt ? 'warp' : 'second';
    const designElevationFt =
      setup === 'first'
        ? elevationOn(first, s.offsetFt, s.distanceFt)
        : setup === 'warp'
          ? elevationOnWarp(warp!, s.offsetFt, s.distanceFt)
          : elevationOn(secondSetup, s.offsetFt, s.distanceFt);
    // The beam rides receiverOffset above grade, so a shorter reading means the ground stands above grade.
    const cutFillFt = Math.round((p.receiverOffsetFt - s.rodReadingFt) * 1e9) / 1e9;
    const amount = Math.abs(cutFillFt).toFixed(2);
    const instruction = cutFillFt > 0 ? `cut ${amount} ft` : cutFillFt < 0 ? `fill ${amount} ft` : 'on grade';
    return { label: s.label, setup, designElevationFt, cutFillFt, instruction };
  });
  return { ...first, description: first.description, stakes, secondSetup, warp };
}

/**
 * The largest jump in design elevation where one setup hands over to the next, on the centreline and
 * `halfWidthFt` either side: zero when they meet. A result saved before the setups were made to meet can carry a
 * step, and a reader uses this to tell.
 */
export function laserStepAtChangeFt(
  r: PlaneSetting & { secondSetup: PlaneSetting; warp?: LaserWarp | null },
  halfWidthFt: number,
): number {
  const second = r.secondSetup;
  const handOver = r.warp ? r.warp.fromDistanceFt : second.originDistanceFt;
  let step = 0;
  for (const offset of [-halfWidthFt, 0, halfWidthFt]) {
    const next = r.warp ? elevationOnWarp(r.warp, offset, handOver) : elevationOn(second, offset, handOver);
    step = Math.max(step, Math.abs(next - elevationOn(r, offset, handOver)));
    if (r.warp)
      step = Math.max(
        step,
        Math.abs(
          elevationOn(second, offset, r.warp.toDistanceFt) - elevationOnWarp(r.warp, offset, r.warp.toDistanceFt),
        ),
      );
  }
  return step;
}
