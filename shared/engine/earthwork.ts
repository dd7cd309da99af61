import { z } from 'zod';
import { EngineInputError, parseInput } from './errors';
import { nonNegative, positive, stationFt } from './numbers';

const CU_FT_PER_CU_YD = 27;
const AREA_MAX = 1e6;

const sectionSchema = z.object({
  stationFt: stationFt(),
  cutSqFt: nonNegative(AREA_MAX),
  fillSqFt: nonNegative(AREA_MAX),
  // Areas halfway to the next section: only the prismoidal formula uses them.
  midCutSqFt: nonNegative(AREA_MAX).optional(),
  midFillSqFt: nonNegative(AREA_MAX).optional(),
});
export type EarthworkSection = z.input<typeof sectionSchema>;

export const earthworkVolumeInputSchema = z.object({
  sections: z.array(sectionSchema).min(2).max(50_000),
  // Where one end area is zero (a daylight point), the pyramid formula L A / 3 is closer than L A / 2.
  endMethod: z.enum(['average', 'pyramid']).default('average'),
  method: z.enum(['average-end-area', 'prismoidal']).default('average-end-area'),
});
export type EarthworkVolumeInput = z.input<typeof earthworkVolumeInputSchema>;

export interface EarthworkSegment {
  fromStationFt: number;
  toStationFt: number;
  cutCuYd: number;
  fillCuYd: number;
}

function segmentVolumeCuFt(
  lengthFt: number,
  a1: number,
  a2: number,
  mid: number | undefined,
  opts: { method: string; endMethod: string },
  field: string,
): number {
  if (a1 === 0 && a2 === 0) return 0;
  if ((a1 === 0 || a2 === 0) && opts.endMethod === 'pyramid') return (lengthFt * (a1 + a2)) / 3;
  if (opts.method === 'prismoidal') {
    if (mid === undefined) throw new EngineInputError(field, 'the prismoidal method needs the mid-section area');
    return (lengthFt * (a1 + 4 * mid + a2)) / 6;
  }
  return (lengthFt * (a1 + a2)) / 2;
}

/** Cut and fill between consecutive cross-sections (average end area or prismoidal), in cubic yards. */
export function earthworkVolume(input: EarthworkVolumeInput): {
  cutCuYd: number;
  fillCuYd: number;
  bySegment: EarthworkSegment[];
} {
  const p = parseInput(earthworkVolumeInputSchema, input);
  const bySegment: EarthworkSegment[] = [];
  let cut = 0;
  let fill = 0;
  for (let i = 0; i < p.sections.length - 1; i++) {
    const a = p.sections[i];
    const b = p.sections[i + 1];
    const lengthFt = b.stationFt - a.stationFt;
    if (!(lengthFt > 0)) {
      throw new EngineInputError(`sections.${i + 1}.stationFt`, 'sections must be in increasing station order');
    }
    const field = `sections.${i}`;
    const cutCuYd =
      segmentVolumeCuFt(lengthFt, a.cutSqFt, b.cutSqFt, a.midCutSqFt, p, `${field}.midCutSqFt`) / CU_FT_PER_CU_YD;
    const fillCuYd =
      segmentVolumeCuFt(lengthFt, a.fillSqFt, b.fillSqFt, a.midFillSqFt, p, `${field}.midFillSqFt`) / CU_FT_PER_CU_YD;
    cut += cutCuYd;
    fill += fillCuYd;
    bySegment.push({ fromStationFt: a.stationFt, toStationFt: b.stationFt, cutCuYd, fillCuYd });
  }
  return { cutCuYd: cut, fillCuYd: fill, bySegment };
}

const volumeSchema = nonNegative(1e9);

export const bankToLooseInputSchema = z.object({ bankCuYd: volumeSchema, swellPercent: nonNegative(200) });
/** Loose volume after digging: bank x (1 + swell). */
export function bankToLoose(input: z.input<typeof bankToLooseInputSchema>): { looseCuYd: number } {
  const p = parseInput(bankToLooseInputSchema, input);
  return { looseCuYd: p.bankCuYd * (1 + p.swellPercent / 100) };
}

export const compactedToBankInputSchema = z.object({ compactedCuYd: volumeSchema, shrinkageFactor: positive(1) });
/** Bank volume needed to make a compacted volume, where shrinkage factor = compacted / bank (e.g. 0.95). */
export function compactedToBank(input: z.input<typeof compactedToBankInputSchema>): { bankCuYd: number } {
  const p = parseInput(compactedToBankInputSchema, input);
  return { bankCuYd: p.compactedCuYd / p.shrinkageFactor };
}

export const bankToCompactedInputSchema = z.object({ bankCuYd: volumeSchema, shrinkageFactor: positive(1) });
export function bankToCompacted(input: z.input<typeof bankToCompactedInputSchema>): { compactedCuYd: number } {
  const p = parseInput(bankToCompactedInputSchema, input);
  return { compactedCuYd: p.bankCuYd * p.shrinkageFactor };
}

export const truckLoadsInputSchema = z.object({ looseCuYd: volumeSchema, truckCuYd: positive(100) });
/** Whole loads: a part-load still needs a trip. */
export function truckLoads(input: z.input<typeof truckLoadsInputSchema>): { loads: number } {
  const p = parseInput(truckLoadsInputSchema, input);
  return { loads: Math.ceil(Math.round((p.looseCuYd / p.truckCuYd) * 1e9) / 1e9) };
}

/**
 * Swell (bank -> loose) and bank -> compacted factors by soil, from memory after US Army FM 5-434 Table 1-1.
 * Starting values for an estimate, not measurements of the site.
 */
export const soilFactors = {
  loam: { bankToLoose: 1.25, bankToCompacted: 0.9 },
  clay: { bankToLoose: 1.43, bankToCompacted: 0.9 },
  sand: { bankToLoose: 1.11, bankToCompacted: 0.95 },
} as const;
