import { describe, expect, it } from 'vitest';
import { checkEntrance, proposeProfile } from '@shared/engine';
import { profileFromRuns, ruleProfile } from './fixtures';
import { holdsWater } from './water';

// The rules here are the common rural template (common practice, no source) with a drainage minimum added.
const fails = (profile: { stationFt: number; elevationFt: number }[], rules: ReturnType<typeof ruleProfile>) =>
  checkEntrance({ profile }, rules)
    .findings.filter((f) => f.status === 'fail')
    .map((f) => f.ruleId);

describe('the design chooses which way each segment drains', () => {
  it('falls against rising ground when the end must sit below the road edge', async () => {
    const rules = ruleProfile({ minDrainageGradePercent: 2 });
    const existing = profileFromRuns([
      [20, 1],
      [40, 6],
    ]);
    // A design exists: level landing, then 2.5% down for 40 ft ends 1 ft below the road edge.
    const built = profileFromRuns([
      [20, 0],
      [40, -2.5],
    ]);
    expect(fails(built, rules)).toEqual([]);
    const r = await proposeProfile({ existing, roadEdgeElevationFt: 100, targetEndElevationFt: 99 }, rules);
    expect(r.reason).toBeUndefined();
    expect(r.feasible).toBe(true);
    expect(r.profile[r.profile.length - 1].elevationFt).toBeCloseTo(99, 6);
    expect(fails(r.profile, rules)).toEqual([]);
    expect(holdsWater(r.profile)).toBe(false);
  });

  it('says impossible, and why, only where no design exists', async () => {
    // A level landing and one 40 ft run held to at least 2%: the end sits at least 0.8 ft above or below the
    // landing, so 0.2 ft above the road edge cannot be met by any profile.
    const rules = ruleProfile({
      minDrainageGradePercent: 2,
      maxGradePercent: 10,
      landing: { lengthFt: 20, minGradePercent: 0, maxGradePercent: 0 },
    });
    const existing = profileFromRuns([
      [20, 0],
      [40, 1],
    ]);
    for (const nearest of [
      profileFromRuns([
        [20, 0],
        [40, 2],
      ]),
      profileFromRuns([
        [20, 0],
        [40, -2],
      ]),
    ])
      expect(fails(nearest, rules)).toEqual([]);
    expect(
      fails(
        profileFromRuns([
          [20, 0],
          [40, 0.5],
        ]),
        rules,
      ),
    ).toContain('grade.min-drainage');
    const r = await proposeProfile({ existing, roadEdgeElevationFt: 100, targetEndElevationFt: 100.2 }, rules);
    expect(r.feasible).toBe(false);
    expect(r.reason).toContain('2% drainage grade');
    expect(r.reason).toContain('at most -0.8 ft or at least +0.8 ft');
    // The same survey with an end the nearest design reaches is feasible.
    const ok = await proposeProfile({ existing, roadEdgeElevationFt: 100, targetEndElevationFt: 100.8 }, rules);
    expect(ok.feasible).toBe(true);
  });

  it('designs a long noisy survey under the drainage rule', async () => {
    const rules = ruleProfile({ minDrainageGradePercent: 1 });
    const existing = Array.from({ length: 400 }, (_, i) => ({
      stationFt: i,
      elevationFt: 100 + 0.3 * Math.sin(i / 7) + 0.05 * Math.sin(i * 1.7),
    }));
    const r = await proposeProfile({ existing, roadEdgeElevationFt: 100 }, rules);
    expect(r.feasible).toBe(true);
    expect(fails(r.profile, rules)).toEqual([]);
    expect(holdsWater(r.profile)).toBe(false);
  }, 60_000);
});
