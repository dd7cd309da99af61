import { advisory, atMost, type Finding } from './findings';
import type { ProfilePoint } from './profile';
import { formatStation } from './station';
import { SURVEY_ELEVATION_PRECISION_FT, stationAtOrAfter } from './station-tolerance';

export interface LowPoint {
  stationFt: number;
  /** How deep water stands before it spills over the lower rim. */
  depthFt: number;
}

/**
 * Low points where the profile falls and then rises, from the road edge on: a flat-bottomed one counts once, at
 * its first station. The last shot is never one (water may run on past the survey) and neither is the first (we
 * cannot see what is before it); a dip shallower than the survey reads elevations is noise.
 */
export function lowPoints(points: readonly ProfilePoint[], roadEdgeStationFt: number): LowPoint[] {
  const found: LowPoint[] = [];
  const y = (i: number) => points[i].elevationFt;
  for (let i = 1; i < points.length - 1; i++) {
    if (!(y(i - 1) > y(i))) continue;
    let j = i;
    while (j < points.length - 1 && y(j + 1) === y(i)) j++;
    if (j === points.length - 1 || !(y(j + 1) > y(i))) continue;
    if (!stationAtOrAfter(points[i].stationFt, roadEdgeStationFt)) continue;
    let left = i - 1;
    while (left > 0 && y(left - 1) >= y(left)) left--;
    let right = j + 1;
    while (right < points.length - 1 && y(right + 1) >= y(right)) right++;
    const depthFt = Math.min(y(left), y(right)) - y(i);
    if (depthFt > SURVEY_ELEVATION_PRECISION_FT + 1e-9) found.push({ stationFt: points[i].stationFt, depthFt });
  }
  return found;
}

const RULE = { ruleId: 'drainage.low-point', label: 'Low point that holds water', unit: 'in' };

/** A fail where the rule profile sets a drainage minimum; said as an item to look at where it sets none. */
export function pondingFinding(
  points: readonly ProfilePoint[],
  roadEdgeStationFt: number,
  minDrainageGradePercent: number | undefined,
): Finding {
  const lows = lowPoints(points, roadEdgeStationFt);
  if (lows.length === 0) return atMost(RULE, 0, 0);
  const deepest = lows.reduce((a, b) => (b.depthFt > a.depthFt ? b : a));
  const depthIn = deepest.depthFt * 12;
  const where = deepest.stationFt <= roadEdgeStationFt ? 'against the road edge' : 'on the driveway';
  const others = lows.length > 1 ? ` (${lows.length} low points in all; this is the deepest)` : '';
  const note =
    `the profile falls to station ${formatStation(deepest.stationFt)} and rises again: it holds water ${where}, ` +
    `up to ${depthIn.toFixed(1)} in deep${others}`;
  const base = { ...RULE, stationFt: deepest.stationFt, note };
  return minDrainageGradePercent === undefined ? advisory(base, depthIn, null, note) : atMost(base, depthIn, 0);
}
