import { z } from 'zod';
import { EngineInputError, parseInput } from './errors';
import { bounded, elevationFt, gradePercent, positive, stationFt } from './numbers';
import { formatStation } from './station';

export interface ProfilePoint {
  stationFt: number;
  elevationFt: number;
}

const MAX_POINTS = 20_000;

const pointSchema = z.object({ stationFt: stationFt(), elevationFt: elevationFt() });

/** Shots as elevations, as rod readings under one instrument height, or as grades read segment by segment. */
export const profileInputSchema = z.union([
  z.array(pointSchema).min(2).max(MAX_POINTS),
  z.object({ kind: z.literal('elevations'), points: z.array(pointSchema).min(2).max(MAX_POINTS) }),
  z.object({
    kind: z.literal('rod-readings'),
    instrumentHeightFt: elevationFt(),
    readings: z.array(z.object({ stationFt: stationFt(), rodFt: bounded(-100, 100) })).min(2).max(MAX_POINTS),
  }),
  z.object({
    kind: z.literal('segment-grades'),
    startStationFt: stationFt().default(0),
    startElevationFt: elevationFt(),
    segments: z.array(z.object({ lengthFt: positive(5_000), gradePercent: gradePercent() })).min(1).max(MAX_POINTS),
  }),
]);
export type ProfileInput = z.input<typeof profileInputSchema>;

// Closer than this, two stations are one: the merge below, and a shot at the road edge, both read them so.
export const SAME_STATION_FT = 1e-6;

function sortAndMerge(points: ProfilePoint[], field: string): ProfilePoint[] {
  const sorted = [...points].sort((a, b) => a.stationFt - b.stationFt);
  const merged: ProfilePoint[] = [];
  for (const point of sorted) {
    const last = merged[merged.length - 1];
    if (last && point.stationFt - last.stationFt < SAME_STATION_FT) {
      // A shot repeated with the same elevation is a harmless re-entry; a different elevation is a real conflict.
      if (Math.abs(point.elevationFt - last.elevationFt) > 1e-9) {
        throw new EngineInputError(
          field,
          `station ${formatStation(point.stationFt)} appears twice with different elevations ` +
            `(${last.elevationFt} and ${point.elevationFt} ft)`,
        );
      }
      continue;
    }
    merged.push({ stationFt: point.stationFt, elevationFt: point.elevationFt });
  }
  if (merged.length < 2) throw new EngineInputError(field, 'a profile needs at least two different stations');
  return merged;
}

function fromParsed(parsed: z.output<typeof profileInputSchema>, field: string): ProfilePoint[] {
  if (Array.isArray(parsed)) return sortAndMerge(parsed, field);
  switch (parsed.kind) {
    case 'elevations':
      return sortAndMerge(parsed.points, `${field}.points`);
    case 'rod-readings':
      // A rod reading is measured down from the line of sight, so elevation = HI - rod.
      return sortAndMerge(
        parsed.readings.map((r) => ({ stationFt: r.stationFt, elevationFt: parsed.instrumentHeightFt - r.rodFt })),
        `${field}.readings`,
      );
    case 'segment-grades': {
      const points: ProfilePoint[] = [{ stationFt: parsed.startStationFt, elevationFt: parsed.startElevationFt }];
      let station = parsed.startStationFt;
      let elevation = parsed.startElevationFt;
      for (const segment of parsed.segments) {
        station += segment.lengthFt;
        elevation += (segment.gradePercent / 100) * segment.lengthFt;
        points.push({ stationFt: station, elevationFt: elevation });
      }
      return points;
    }
  }
}

/** Validates any accepted profile form and returns points sorted by station with duplicates resolved. */
export function normalizeProfile(input: unknown, field = 'profile'): ProfilePoint[] {
  return fromParsed(parseInput(profileInputSchema, input, field), field);
}

/** For callers that already validated with profileInputSchema. */
export const normalizeParsedProfile = fromParsed;

export interface ProfileSegment {
  fromStationFt: number;
  toStationFt: number;
  gradePercent: number;
}

export function segmentGrades(points: readonly ProfilePoint[]): ProfileSegment[] {
  const segments: ProfileSegment[] = new Array(points.length - 1);
  for (let i = 0; i < points.length - 1; i++) {
    const a = points[i];
    const b = points[i + 1];
    segments[i] = {
      fromStationFt: a.stationFt,
      toStationFt: b.stationFt,
      gradePercent: ((b.elevationFt - a.elevationFt) / (b.stationFt - a.stationFt)) * 100,
    };
  }
  return segments;
}

export interface GradeBreak {
  stationFt: number;
  /** Algebraic difference, next grade minus previous grade: + is a sag, - a crest. */
  changePercent: number;
}

export function gradeBreaks(segments: readonly ProfileSegment[]): GradeBreak[] {
  const breaks: GradeBreak[] = [];
  for (let i = 1; i < segments.length; i++) {
    breaks.push({
      stationFt: segments[i].fromStationFt,
      changePercent: segments[i].gradePercent - segments[i - 1].gradePercent,
    });
  }
  return breaks;
}

/** Elevation on the straight lines between shots; stations outside the profile take the end elevation. */
export function elevationAt(points: readonly ProfilePoint[], station: number): number {
  if (station <= points[0].stationFt) return points[0].elevationFt;
  const last = points[points.length - 1];
  if (station >= last.stationFt) return last.elevationFt;
  let lo = 0;
  let hi = points.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (points[mid].stationFt <= station) lo = mid;
    else hi = mid;
  }
  const a = points[lo];
  const b = points[hi];
  return a.elevationFt + ((station - a.stationFt) / (b.stationFt - a.stationFt)) * (b.elevationFt - a.elevationFt);
}
