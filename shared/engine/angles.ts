import { z } from 'zod';
import { parseInput } from './errors';
import { bounded } from './numbers';

const DEG = 180 / Math.PI;

export const gradePercentToDegrees = (gradePercent: number): number => {
  const p = parseInput(bounded(-1_000, 1_000), gradePercent, 'gradePercent');
  return Math.atan(p / 100) * DEG;
};

export const breakOverAngleInputSchema = z.object({ clearanceIn: bounded(0, 60), wheelbaseFt: bounded(1, 100) });

/** The sharpest crest a body of this clearance and wheelbase can straddle: 2 atan(2h / W). */
export function breakOverAngleDeg(input: z.input<typeof breakOverAngleInputSchema>): number {
  const p = parseInput(breakOverAngleInputSchema, input);
  return 2 * Math.atan((2 * (p.clearanceIn / 12)) / p.wheelbaseFt) * DEG;
}
