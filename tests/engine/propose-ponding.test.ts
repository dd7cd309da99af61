import { describe, expect, it } from 'vitest';
import { checkEntrance, commonRuralTemplate, proposeProfile } from '@shared/engine';
import { profileFromRuns, ruleProfile } from './fixtures';
import { directionChanges, holdsWater } from './water';

/** Level ground with survey noise of a few hundredths of a foot, the same every run. */
const flatNoisy = Array.from({ length: 81 }, (_, i) => ({
  stationFt: i,
  elevationFt: 100 + 0.04 * Math.sin(i * 2.1) + 0.03 * Math.sin(i * 0.7 + 1),
}));

describe('the proposal never leaves water standing', () => {
  it('does not zig-zag on a flat, noisy survey under the drainage rule', async () => {
    const rules = ruleProfile({ minDrainageGradePercent: 1 });
    const r = await proposeProfile({ existing: flatNoisy, roadEdgeElevationFt: 100 }, rules);
    expect(r.feasible).toBe(true);
    expect(holdsWater(r.profile)).toBe(false);
    expect(directionChanges(r.profile)).toBeLessThanOrEqual(1);
    expect(checkEntrance({ profile: r.profile }, rules).findings.filter((f) => f.status === 'fail')).toEqual([]);
  });

  it('leaves no low point on a flat, noisy survey without a drainage rule', async () => {
    const r = await proposeProfile({ existing: flatNoisy, roadEdgeElevationFt: 100 }, commonRuralTemplate);
    expect(r.feasible).toBe(true);
    expect(holdsWater(r.profile)).toBe(false);
  });

  it('fills a dip beside the road rather than leave water against it', async () => {
    // Ground falls 3% from the road edge for 20 ft, then climbs: following it would pond against the road.
    const existing = profileFromRuns([
      [10, -3],
      [10, -3],
      [40, 8],
    ]);
    expect(holdsWater(existing)).toBe(true);
    const r = await proposeProfile({ existing, roadEdgeElevationFt: 100 }, commonRuralTemplate);
    expect(r.feasible).toBe(true);
    expect(holdsWater(r.profile)).toBe(false);
    expect(
      checkEntrance({ profile: r.profile }, commonRuralTemplate).findings.filter((f) => f.status === 'fail'),
    ).toEqual([]);
  });
});
