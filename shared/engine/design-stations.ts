import { bracketing, elevationAt, type ProfilePoint } from './profile';
import { STATION_TOLERANCE_FT } from './station-tolerance';

/** Whether a sorted profile has a station within `gap` of s. */
function near(points: readonly ProfilePoint[], s: number, gap: number): boolean {
  const [lo, hi] = bracketing(points, s);
  return Math.abs(points[lo].stationFt - s) < gap || Math.abs(points[hi].stationFt - s) < gap;
}

/**
 * Adds ground points at the given stations, ground read on the straight lines between shots, skipping any
 * within `gap` of a station already there (a surveyed shot is never replaced).
 */
export function withStations(
  ground: readonly ProfilePoint[],
  stations: readonly number[],
  gap = STATION_TOLERANCE_FT,
): ProfilePoint[] {
  const first = ground[0].stationFt;
  const last = ground[ground.length - 1].stationFt;
  const added: ProfilePoint[] = [];
  for (const s of [...stations].sort((a, b) => a - b)) {
    if (
      s <= first ||
      s >= last ||
      near(ground, s, gap) ||
      (added.length > 0 && s - added[added.length - 1].stationFt < gap)
    )
      continue;
    added.push({ stationFt: s, elevationFt: elevationAt(ground, s) });
  }
  if (added.length === 0) return [...ground];
  return [...ground, ...added].sort((a, b) => a.stationFt - b.stationFt);
}

/**
 * Stations every `stepFt` for `radiusFt` either side of each break, so the design can bend there through a
 * short vertical curve instead of one sharp break. Never more than `room` new stations.
 */
export function transitionStations(
  points: readonly ProfilePoint[],
  breaks: readonly number[],
  radiusFt: number,
  stepFt: number,
  room: number,
): number[] {
  const out: number[] = [];
  for (const b of breaks) {
    const from = b - radiusFt;
    for (let k = 0; from + k * stepFt <= b + radiusFt; k++) {
      if (out.length >= room) return out;
      out.push(from + k * stepFt);
    }
  }
  return out.filter((s) => s > points[0].stationFt && s < points[points.length - 1].stationFt);
}
