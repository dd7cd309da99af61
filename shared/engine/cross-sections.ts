import { z } from 'zod';
import { type EarthworkSegment, earthworkVolume } from './earthwork';
import { EngineInputError, parseInput } from './errors';
import { bounded, nonNegative, positive } from './numbers';
import { elevationAt, type ProfilePoint, profileInputSchema, normalizeParsedProfile } from './profile';

export const sectionTemplateSchema = z.object({
  topWidthFt: positive(200),
  cutSlopeHPerV: nonNegative(20),
  fillSlopeHPerV: nonNegative(20),
  // Ground across the centreline, + rising to the right looking away from the road.
  groundCrossSlopePercent: bounded(-100, 100).default(0),
});
export type SectionTemplate = z.output<typeof sectionTemplateSchema>;

/** Integral of max(f, 0) and max(-f, 0) for f linear from f0 at x0 to f1 at x1. */
function splitIntegral(x0: number, x1: number, f0: number, f1: number): { pos: number; neg: number } {
  const len = x1 - x0;
  if (len <= 0) return { pos: 0, neg: 0 };
  if (f0 >= 0 && f1 >= 0) return { pos: (len * (f0 + f1)) / 2, neg: 0 };
  if (f0 <= 0 && f1 <= 0) return { pos: 0, neg: (-len * (f0 + f1)) / 2 };
  const xz = (len * f0) / (f0 - f1);
  const first = (xz * Math.abs(f0)) / 2;
  const second = ((len - xz) * Math.abs(f1)) / 2;
  return f0 > 0 ? { pos: first, neg: second } : { pos: second, neg: first };
}

/**
 * One side of the section, measured outward from the centreline: ground is depth + slope * x above the
 * design surface. Returns the cut and fill areas from the centreline to the catch point.
 */
function halfSection(depthFt: number, groundSlope: number, t: SectionTemplate, field: string) {
  const w = t.topWidthFt / 2;
  const inner = splitIntegral(0, w, depthFt, depthFt + groundSlope * w);
  const edgeHeight = depthFt + groundSlope * w;
  let catchX: number;
  let outerCut = 0;
  let outerFill = 0;
  if (edgeHeight >= 0) {
    const denom = 1 - t.cutSlopeHPerV * groundSlope;
    if (denom <= 0)
      throw new EngineInputError(field, 'the ground rises as steeply as the cut slope and never meets it');
    catchX = (t.cutSlopeHPerV * depthFt + w) / denom;
    outerCut = ((catchX - w) * edgeHeight) / 2;
  } else {
    const denom = 1 + t.fillSlopeHPerV * groundSlope;
    if (denom <= 0)
      throw new EngineInputError(field, 'the ground falls as steeply as the fill slope and never meets it');
    catchX = (w - t.fillSlopeHPerV * depthFt) / denom;
    outerFill = ((catchX - w) * -edgeHeight) / 2;
  }
  return { cut: inner.pos + outerCut, fill: inner.neg + outerFill, catchFt: catchX };
}

export function crossSectionAreas(depthFt: number, template: SectionTemplate, field = 'section') {
  const g = template.groundCrossSlopePercent / 100;
  const right = halfSection(depthFt, g, template, field);
  const left = halfSection(depthFt, -g, template, field);
  return {
    cutSqFt: right.cut + left.cut,
    fillSqFt: right.fill + left.fill,
    leftCatchFt: left.catchFt,
    rightCatchFt: right.catchFt,
  };
}

export const earthworkFromProfilesInputSchema = z.object({
  existing: profileInputSchema,
  design: profileInputSchema,
  template: sectionTemplateSchema,
  method: z.enum(['average-end-area', 'prismoidal']).default('average-end-area'),
  endMethod: z.enum(['average', 'pyramid']).default('average'),
});
export type EarthworkFromProfilesInput = z.input<typeof earthworkFromProfilesInputSchema>;

export interface StationSection {
  stationFt: number;
  existingFt: number;
  designFt: number;
  /** Existing minus design at the centreline: + is cut, - is fill. */
  cutFillFt: number;
  cutSqFt: number;
  fillSqFt: number;
}

function stationsWithZeroCrossings(existing: ProfilePoint[], design: ProfilePoint[]): number[] {
  const lo = Math.max(existing[0].stationFt, design[0].stationFt);
  const hi = Math.min(existing[existing.length - 1].stationFt, design[design.length - 1].stationFt);
  if (!(hi > lo)) throw new EngineInputError('design', 'the design and existing profiles do not overlap');
  const set = new Set<number>([lo, hi]);
  for (const p of [...existing, ...design]) if (p.stationFt > lo && p.stationFt < hi) set.add(p.stationFt);
  const base = [...set].sort((a, b) => a - b);
  const out: number[] = [base[0]];
  const depth = (s: number) => elevationAt(existing, s) - elevationAt(design, s);
  for (let i = 1; i < base.length; i++) {
    const d0 = depth(base[i - 1]);
    const d1 = depth(base[i]);
    // Cut turning to fill inside a segment gets its own section so neither volume is averaged across the change.
    if ((d0 > 0 && d1 < 0) || (d0 < 0 && d1 > 0)) out.push(base[i - 1] + ((base[i] - base[i - 1]) * d0) / (d0 - d1));
    out.push(base[i]);
  }
  return out;
}

/** Cross-sections over the existing and design profiles and the cut and fill volumes between them. */
export function earthworkFromProfiles(input: EarthworkFromProfilesInput): {
  sections: StationSection[];
  cutCuYd: number;
  fillCuYd: number;
  bySegment: EarthworkSegment[];
} {
  const p = parseInput(earthworkFromProfilesInputSchema, input);
  const existing = normalizeParsedProfile(p.existing, 'existing');
  const design = normalizeParsedProfile(p.design, 'design');
  const stations = stationsWithZeroCrossings(existing, design);
  const sectionAt = (s: number) => {
    const existingFt = elevationAt(existing, s);
    const designFt = elevationAt(design, s);
    const areas = crossSectionAreas(existingFt - designFt, p.template, 'template.groundCrossSlopePercent');
    return {
      stationFt: s,
      existingFt,
      designFt,
      cutFillFt: existingFt - designFt,
      cutSqFt: areas.cutSqFt,
      fillSqFt: areas.fillSqFt,
    };
  };
  const sections = stations.map(sectionAt);
  const forVolume = sections.map((sec, i) => {
    if (p.method !== 'prismoidal' || i === sections.length - 1) return sec;
    const mid = sectionAt((sec.stationFt + sections[i + 1].stationFt) / 2);
    return { ...sec, midCutSqFt: mid.cutSqFt, midFillSqFt: mid.fillSqFt };
  });
  const volume = earthworkVolume({ sections: forVolume, method: p.method, endMethod: p.endMethod });
  return { sections, ...volume };
}
