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

/** AASHTO stopping sight distance; on a grade the braking term uses a/g + G. */
export function stoppingSightDistance(input: StoppingSightDistanceInput): { computedFt: number; designFt: number } {
  const { speedMph: v, gradePercent, reactionTimeS: t, decelFtPerS2: a } = parseInput(
    stoppingSightDistanceInputSchema,
    input,
  );
  const g = gradePercent / 100;
  const brakingDivisor = 30 * (a / GRAVITY_FT_PER_S2 + g);
  if (brakingDivisor <= 0) {
    throw new EngineInputError('gradePercent', 'the downgrade is steeper than the braking rate can hold');
  }
  // On level ground the 30(a/g) form is written with the rounded constant 1.075, as published; both are kept
  // so that the level-road design table reproduces exactly.
  const braking = g === 0 ? (1.075 * v * v) / a : (v * v) / brakingDivisor;
  const computedFt = FT_PER_S_PER_MPH * v * t + braking;
  return { computedFt, designFt: roundUpTo(computedFt, DESIGN_ROUNDING_FT) };
}

export type DesignVehicleClass = 'passenger' | 'single-unit' | 'combination';

const TIME_GAP_S: Record<DesignVehicleClass, { left: number; right: number }> = {
  passenger: { left: 7.5, right: 6.5 },
  'single-unit': { left: 9.5, right: 8.5 },
  combination: { left: 11.5, right: 10.5 },
};

export const intersectionSightDistanceInputSchema = z.object({
  speedMph: bounded(5, 100),
  turn: z.enum(['left', 'right']),
  vehicle: z.enum(['passenger', 'single-unit', 'combination']).default('passenger'),
  extraLanes: z.number().int().min(0).max(10).default(0),
  // + means the driveway rises toward the road (the car pulling out climbs).
  approachGradePercent: bounded(-50, 50).default(0),
  gradeReading: z.enum(['whole-grade', 'above-3-percent']).default('whole-grade'),
});
export type IntersectionSightDistanceInput = z.input<typeof intersectionSightDistanceInputSchema>;

const GRADE_THRESHOLD_PERCENT = 3;

/**
 * AASHTO intersection sight distance for a stop-controlled departure (1.47 V tg).
 * Approach grade: the adjustment applies only above 3%; "0.2 s per percent of grade" is read by default as
 * per percent of the WHOLE grade (a 5% approach adds 5 x 0.2 = 1.0 s on a left turn), which is the literal
 * wording and the larger gap. `gradeReading: 'above-3-percent'` counts only the part above 3% instead.
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
