import {
  checkAsBuilt,
  elevationAt,
  parseStation,
  type AsBuiltReadingResult,
  type AsBuiltStatus,
  type ProfilePoint,
  type RuleProfile,
} from '@shared/engine';
import type { AsBuiltReadingInput } from '@shared/crew/crew-inputs';
import { ft, pct } from './format';

export interface ReadingRow {
  key: number;
  station: string;
  kind: 'grade' | 'elevation';
  value: string;
}

export interface RowCheck {
  reading: AsBuiltReadingInput | null;
  error: string | null;
  status: AsBuiltStatus | null;
  results: AsBuiltReadingResult[];
}

export interface CheckBasis {
  ruleProfile: RuleProfile;
  design: ProfilePoint[] | null;
  roadEdgeStationFt: number;
}

function toReading(row: ReadingRow): { reading: AsBuiltReadingInput | null; error: string | null } {
  if (row.station.trim() === '' && row.value.trim() === '') return { reading: null, error: null };
  let stationFt: number;
  try {
    stationFt = parseStation(row.station);
  } catch {
    return { reading: null, error: 'Station: e.g. 0+20 or 20' };
  }
  const value = Number(row.value);
  if (row.value.trim() === '' || !Number.isFinite(value))
    return { reading: null, error: row.kind === 'grade' ? 'Grade: a number in %' : 'Elevation: a number in ft' };
  return {
    reading: row.kind === 'grade' ? { stationFt, gradePercent: value } : { stationFt, elevationFt: value },
    error: null,
  };
}

const worst = (list: AsBuiltReadingResult[]): AsBuiltStatus | null =>
  list.length === 0
    ? null
    : list.some((r) => r.status === 'fail')
      ? 'fail'
      : list.some((r) => r.status === 'advisory')
        ? 'advisory'
        : 'pass';

const run = (basis: CheckBasis, readings: AsBuiltReadingInput[]) =>
  checkAsBuilt({
    readings: readings as never,
    ruleProfile: basis.ruleProfile,
    design: basis.design ?? undefined,
    roadEdgeStationFt: basis.roadEdgeStationFt,
  });

/**
 * Each reading checked the moment it is typed, by the same engine the server uses on save. A grade stands on
 * its own; an elevation is judged on the grade from the shot before it (by station) and its distance off design.
 */
export function checkRows(rows: ReadingRow[], basis: CheckBasis): RowCheck[] {
  const parsed = rows.map(toReading);
  const elevations = parsed
    .map((p, i) => ({ p, i }))
    .filter(({ p }) => p.reading && p.reading.elevationFt !== undefined)
    .sort((a, b) => a.p.reading!.stationFt - b.p.reading!.stationFt);
  return parsed.map(({ reading, error }, i) => {
    if (!reading) return { reading, error, status: null, results: [] };
    try {
      if (reading.gradePercent !== undefined) {
        const results = run(basis, [reading]).readings;
        return { reading, error, status: worst(results), results };
      }
      const at = elevations.findIndex((e) => e.i === i);
      const previous = at > 0 ? elevations[at - 1].p.reading! : null;
      const shots = previous && previous.stationFt !== reading.stationFt ? [previous, reading] : [reading];
      const results = run(basis, shots).readings.filter((r) =>
        r.ruleId === 'as-built.elevation' ? r.stationFt === reading.stationFt : shots.length === 2,
      );
      return { reading, error, status: worst(results), results };
    } catch (e) {
      return {
        reading: null,
        error: e instanceof Error ? e.message : 'Cannot check this reading',
        status: null,
        results: [],
      };
    }
  });
}

export function checkWholeSet(checks: RowCheck[], basis: CheckBasis) {
  const readings = checks.flatMap((c) => (c.reading ? [c.reading] : []));
  if (readings.length === 0) return null;
  try {
    return run(basis, readings);
  } catch {
    return null;
  }
}

/** The design at a station: its elevation and the grade of the design line it lies on (the next one at a break). */
export interface DesignHere {
  elevationFt: number;
  gradePercent: number;
}

/** What the design says at a station, or null without a design or outside it. */
export function designAt(design: readonly ProfilePoint[] | null, stationFt: number): DesignHere | null {
  if (!design || design.length < 2 || !Number.isFinite(stationFt)) return null;
  const first = design[0].stationFt;
  const last = design[design.length - 1].stationFt;
  if (stationFt < first - 1e-9 || stationFt > last + 1e-9) return null;
  let i = design.findIndex((p, k) => k < design.length - 1 && stationFt < design[k + 1].stationFt - 1e-9);
  if (i < 0) i = design.length - 2;
  const a = design[i];
  const b = design[i + 1];
  return {
    elevationFt: elevationAt(design, stationFt),
    gradePercent: ((b.elevationFt - a.elevationFt) / (b.stationFt - a.stationFt)) * 100,
  };
}

/** The grade the rule profile allows at a station: the landing's range near the road, the driveway's limit beyond. */
export function allowedGradeAt(rules: RuleProfile, roadEdgeStationFt: number, stationFt: number) {
  return stationFt - roadEdgeStationFt < rules.landing.lengthFt - 1e-9
    ? {
        minPercent: rules.landing.minGradePercent,
        maxPercent: rules.landing.maxGradePercent,
        where: 'landing' as const,
      }
    : { minPercent: null, maxPercent: rules.maxGradePercent, where: 'driveway' as const };
}

/** In words, what the station should be built to: the design's elevation and grade, else the grade allowed there. */
export function designWords(basis: CheckBasis, stationFt: number): string {
  const here = designAt(basis.design, stationFt);
  if (here) return `Design here: ${ft(here.elevationFt)}, grade ${pct(here.gradePercent, 1)}`;
  const allowed = allowedGradeAt(basis.ruleProfile, basis.roadEdgeStationFt, stationFt);
  return allowed.minPercent === null
    ? `No design here; the driveway allows at most ${pct(allowed.maxPercent, 1)}`
    : `No design here; the landing allows ${pct(allowed.minPercent, 1)} to ${pct(allowed.maxPercent, 1)}`;
}
