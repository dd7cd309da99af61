import { z } from 'zod';
import { parseInput } from './errors';
import { bounded, positive } from './numbers';

const MANNING_US = 1.49;

export const pipeFullFlowInputSchema = z.object({
  diameterIn: positive(240),
  manningN: bounded(0.005, 0.1),
  slopeFtPerFt: bounded(0, 1),
});
export type PipeFullFlowInput = z.input<typeof pipeFullFlowInputSchema>;

/** Manning's equation for a circular pipe flowing full (R = D/4), US units, exact form. */
export function pipeFullFlow(input: PipeFullFlowInput): { flowCfs: number; velocityFtPerS: number; areaSqFt: number } {
  const { diameterIn, manningN, slopeFtPerFt } = parseInput(pipeFullFlowInputSchema, input);
  const d = diameterIn / 12;
  const areaSqFt = (Math.PI * d * d) / 4;
  const velocityFtPerS = (MANNING_US / manningN) * (d / 4) ** (2 / 3) * Math.sqrt(slopeFtPerFt);
  return { flowCfs: velocityFtPerS * areaSqFt, velocityFtPerS, areaSqFt };
}

// HEC-22 Table 3-1: storms rarer than 10 years run off more of their rain than C alone says.
const FREQUENCY_FACTORS: readonly { minYears: number; factor: number }[] = [
  { minYears: 100, factor: 1.25 },
  { minYears: 50, factor: 1.2 },
  { minYears: 25, factor: 1.1 },
];

export const rationalFlowInputSchema = z.object({
  runoffC: bounded(0, 1),
  intensityInPerHr: bounded(0, 50),
  // The rational method is meant for small areas (HEC-22: up to 200 acres).
  areaAcres: bounded(0, 200),
  returnPeriodYears: z.number().int().min(1).max(500).default(10),
});
export type RationalFlowInput = z.input<typeof rationalFlowInputSchema>;

/** Q = Cf C i A (Ku = 1 in US units); Cf applies to the rarer storms, and C x Cf never exceeds 1. */
export function rationalFlow(input: RationalFlowInput): { flowCfs: number; adjustedC: number } {
  const p = parseInput(rationalFlowInputSchema, input);
  const cf = FREQUENCY_FACTORS.find((f) => p.returnPeriodYears >= f.minYears)?.factor ?? 1;
  const adjustedC = Math.min(1, p.runoffC * cf);
  return { flowCfs: adjustedC * p.intensityInPerHr * p.areaAcres, adjustedC };
}
