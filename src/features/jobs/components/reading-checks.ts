import {
  checkAsBuilt,
  parseStation,
  type AsBuiltReadingResult,
  type AsBuiltStatus,
  type ProfilePoint,
  type RuleProfile,
} from '@shared/engine';
import type { AsBuiltReadingInput } from '@shared/crew/crew-inputs';

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
