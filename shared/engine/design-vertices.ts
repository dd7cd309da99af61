import type { ProfilePoint } from './profile';
import { STATION_TOLERANCE_FT } from './station-tolerance';

/**
 * The closest two grade breaks of a proposed design may sit, away from the road edge, the landing's end and a
 * vertical curve. A crew sets grade stakes and shapes the subgrade with a blade several feet long, so breaks a
 * couple of feet apart on a densely shot survey cannot be built as drawn; 5 ft is common practice (no source).
 * The design is still measured at every survey station (straight between its vertices), so the earth moved is
 * counted exactly; only where it may bend is limited.
 */
export const MIN_VERTEX_SPACING_FT = 5;

/** Stretches of the profile where breaks may sit closer: a short vertical curve over stations `stepFt` apart. */
export interface FineStretch {
  fromFt: number;
  toFt: number;
  stepFt: number;
}

/**
 * Indices of the stations where the design may break: the first and last, every station in `keep` (the
 * landing's end, added transition stations) and, between them, the next station at least the allowed spacing
 * past the last vertex.
 */
export function designVertices(
  points: readonly ProfilePoint[],
  keep: ReadonlySet<number>,
  fine: readonly FineStretch[] = [],
): number[] {
  const spacingAt = (s: number) => {
    let step = MIN_VERTEX_SPACING_FT;
    for (const f of fine)
      if (s >= f.fromFt - STATION_TOLERANCE_FT && s <= f.toFt + STATION_TOLERANCE_FT) step = Math.min(step, f.stepFt);
    return step;
  };
  const out = [0];
  const last = points.length - 1;
  for (let i = 1; i < last; i++) {
    const s = points[i].stationFt;
    const prev = points[out[out.length - 1]].stationFt;
    if (keep.has(s) || s - prev >= spacingAt(s) - STATION_TOLERANCE_FT) out.push(i);
  }
  if (last > 0) out.push(last);
  return out;
}
