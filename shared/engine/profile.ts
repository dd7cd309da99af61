import { z } from 'zod';
import { EngineInputError, parseInput } from './errors';
import { bounded, elevationFt, gradePercent, positive, stationFt } from './numbers';
import { formatStation } from './station';
import { STATION_TOLERANCE_FT, SURVEY_ELEVATION_PRECISION_FT, tooCloseToSurvey } from './station-tolerance';

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
    readings: z
      .array(z.object({ stationFt: stationFt(), rodFt: bounded(-100, 100) }))
      .min(2)
      .max(MAX_POINTS),
  }),
  z.object({
    kind: z.literal('segment-grades'),
    startStationFt: stationFt().default(0),
    startElevationFt: elevationFt(),
    segments: z
      .array(z.object({ lengthFt: positive(5_000), gradePercent: gradePercent() }))
      .min(1)
      .max(MAX_POINTS),
  }),
]);
export type ProfileInput = z.input<typeof profileInputSchema>;

interface Shot extends ProfilePoint {
  /** Where the shot was in the input, so a refusal can name the box it was typed in. */
  index: number;
}

/**
 * Shots closer together than the survey's station precision are one place: merged when their elevations agree to
 * the survey's elevation precision (a re-entered or re-read shot), refused otherwise, since the grade between them
 * would be noise divided by almost nothing.
 */
function sortAndMerge(points: readonly ProfilePoint[], field: string): ProfilePoint[] {
  const sorted: Shot[] = points
    .map((p, index) => ({ stationFt: p.stationFt, elevationFt: p.elevationFt, index }))
    .sort((a, b) => a.stationFt - b.stationFt);
  const merged: (ProfilePoint & { first: Shot })[] = [];
  for (const shot of sorted) {
    const last = merged[merged.length - 1];
    if (last && tooCloseToSurvey(shot.stationFt, last.stationFt)) {
      if (Math.abs(shot.elevationFt - last.elevationFt) > SURVEY_ELEVATION_PRECISION_FT + 1e-9) {
        const [a, b] = last.first.index < shot.index ? [last.first, shot] : [shot, last.first];
        const elevations = `(${a.elevationFt} and ${b.elevationFt} ft)`;
        const message =
          a.stationFt === b.stationFt
            ? `station ${formatStation(b.stationFt)} appears twice with different elevations ${elevations}`
            : `station ${formatStation(b.stationFt, 5)} is closer than ${STATION_TOLERANCE_FT} ft to station ` +
              `${formatStation(a.stationFt, 5)} but the elevations differ ${elevations}; correct one or remove the repeat`;
        throw new EngineInputError(`${field}.${b.index}.stationFt`, message);
      }
      last.stationFt = (last.stationFt + shot.stationFt) / 2;
      last.elevationFt = (last.elevationFt + shot.elevationFt) / 2;
      continue;
    }
    merged.push({ stationFt: shot.stationFt, elevationFt: shot.elevationFt, first: shot });
  }
  if (merged.length < 2) throw new EngineInputError(field, 'a profile needs at least two different stations');
  return merged.map((p) => ({ stationFt: p.stationFt, elevationFt: p.elevationFt }));
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
      for (const [i, segment] of parsed.segments.entries()) {
        if (segment.lengthFt < STATION_TOLERANCE_FT) {
          throw new EngineInputError(
            `${field}.segments.${i}.lengthFt`,
            `a segment shorter than the survey's ${STATION_TOLERANCE_FT} ft precision cannot give a grade`,
          );
        }
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

/** The indexes of the two neighbouring shots of a sorted profile that a station falls between (a binary search). */
export function bracketing(points: readonly ProfilePoint[], station: number): [number, number] {
  let lo = 0;
  let hi = points.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (points[mid].stationFt <= station) lo = mid;
    else hi = mid;
  }
  return [lo, hi];
}

/** Elevation on the straight lines between shots; stations outside the profile take the end elevation. */
export function elevationAt(points: readonly ProfilePoint[], station: number): number {
  if (station <= points[0].stationFt) return points[0].elevationFt;
  const last = points[points.length - 1];
  if (station >= last.stationFt) return last.elevationFt;
  const [lo, hi] = bracketing(points, station);
  const a = points[lo];
  const b = points[hi];
  return a.elevationFt + ((station - a.stationFt) / (b.stationFt - a.stationFt)) * (b.elevationFt - a.elevationFt);
}
