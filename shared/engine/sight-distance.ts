import { z } from 'zod';
import { EngineInputError, parseInput } from './errors';
import { bounded, positive, roundUpTo } from './numbers';

const DESIGN_ROUNDING_FT = 5;
const FT_PER_S_PER_MPH = 1.47;
const GRAVITY_FT_PER_S2 = 32.2;

export const stoppingSightDistanceInputSchema = z.object({
  speedMph: bounded(5, 100),
  // + is uphill, in the direction of travel.
  gradePercent: bounded(-20, 20).default(0),
  reactionTimeS: positive(10).default(2.5),
  decelFtPerS2: positive(30).default(11.2),
});
export type StoppingSightDistanceInput = z.input<typeof stoppingSightDistanceInputSchema>;

/**
 * AASHTO stopping sight distance in its grade form, 1.47 V t + V^2 / (30 (a/32.2 + G)), used for every grade
 * including level (G = 0). The level-road formula's rounded constant 1.075 V^2 / a reads 0.2 ft longer at 40 mph;
 * using one form keeps the distance continuous through 0%, and the published design values (rounded up to 5 ft)
 * come out the same either way.
 */
export function stoppingSightDistance(input: StoppingSightDistanceInput): { computedFt: number; designFt: number } {
  const {
    speedMph: v,
    gradePercent,
    reactionTimeS: t,
    decelFtPerS2: a,
  } = parseInput(stoppingSightDistanceInputSchema, input);
  const g = gradePercent / 100;
  const brakingDivisor = 30 * (a / GRAVITY_FT_PER_S2 + g);
  if (brakingDivisor <= 0) {
    throw new EngineInputError('gradePercent', 'the downgrade is steeper than the braking rate can hold');
  }
  const braking = (v * v) / brakingDivisor;
  const computedFt = FT_PER_S_PER_MPH * v * t + braking;
  return { computedFt, designFt: roundUpTo(computedFt, DESIGN_ROUNDING_FT) };
}

export type DesignVehicleClass = 'passenger' | 'single-unit' | 'combination';

const TIME_GAP_S: Record<DesignVehicleClass, { left: number; right: number }> = {
  passenger: { left: 7.5, right: 6.5 },
  'single-unit': { left: 9.5, right: 8.5 },
  combination: { left: 11.5, right: 10.5 },
};

/**
 * How "0.2 s per percent of grade" above a 3% approach is read. 'above-3-percent' counts only the part of the grade
 * above 3%, so the gap grows from nothing at 3% with no jump; 'whole-grade' counts every percent once past 3%, the
 * literal wording, which jumps by 0.6 s (left) at 3%. A road authority that reads it literally says so in its rule
 * profile; the continuous reading is the default.
 */
export const approachGradeReadings = ['above-3-percent', 'whole-grade'] as const;
export type ApproachGradeReading = (typeof approachGradeReadings)[number];

export const intersectionSightDistanceInputSchema = z.object({
  speedMph: bounded(5, 100),
  turn: z.enum(['left', 'right']),
  vehicle: z.enum(['passenger', 'single-unit', 'combination']).default('passenger'),
  extraLanes: z.number().int().min(0).max(10).default(0),
  // + means the driveway rises toward the road (the car pulling out climbs).
  approachGradePercent: bounded(-50, 50).default(0),
  gradeReading: z.enum(approachGradeReadings).default('above-3-percent'),
});
export type IntersectionSightDistanceInput = z.input<typeof intersectionSightDistanceInputSchema>;

const GRADE_THRESHOLD_PERCENT = 3;

/**
 * AASHTO intersection sight distance for a stop-controlled departure (1.47 V tg). The approach-grade adjustment
 * applies only above 3%, read as `gradeReading` says (see approachGradeReadings).
 */
export function intersectionSightDistance(input: IntersectionSightDistanceInput): {
  timeGapS: number;
  computedFt: number;
  designFt: number;
} {
  const p = parseInput(intersectionSightDistanceInputSchema, input);
  const base = TIME_GAP_S[p.vehicle][p.turn];
  const perLane = p.vehicle === 'passenger' ? 0.5 : 0.7;
  let timeGapS = base + perLane * p.extraLanes;
  if (p.approachGradePercent > GRADE_THRESHOLD_PERCENT) {
    const counted =
      p.gradeReading === 'whole-grade' ? p.approachGradePercent : p.approachGradePercent - GRADE_THRESHOLD_PERCENT;
    timeGapS += (p.turn === 'left' ? 0.2 : 0.1) * counted;
  }
  const computedFt = FT_PER_S_PER_MPH * p.speedMph * timeGapS;
  return { timeGapS, computedFt, designFt: roundUpTo(computedFt, DESIGN_ROUNDING_FT) };
}
