import { describe, expect, it } from 'vitest';
import { checkEntrance, proposeProfile } from '@shared/engine';
import { findingOf, profileFromRuns, ruleProfile } from './fixtures';

// The proposal is held to the same road-edge break and scrape as checkEntrance when the road side is given.
// Limits: the common rural template (common practice (no source)) with a steeper landing where stated; the
// passenger car is its design vehicle (wheelbase and overhangs from memory; 5 in clearance after Eck and Kang,
// TRR 1356). Grade change is the algebraic difference of the two grades (exact geometry).
describe('the proposal and the road side', () => {
  it('keeps the break at the road edge within the limit: road 3% down to the edge, ground rising 11%', async () => {
    const rules = ruleProfile({ landing: { lengthFt: 20, minGradePercent: -12, maxGradePercent: 12 } });
    const existing = profileFromRuns([
      [20, 11],
      [30, 11],
    ]);
    const roadSide = { roadCrossSlopePercent: 3 };
    // The ground itself breaks 14% at the road edge, over the 13% limit.
    expect(
      findingOf(checkEntrance({ profile: existing, roadSide }, rules).findings, 'grade.road-edge-change').status,
    ).toBe('fail');
    const r = await proposeProfile({ existing, roadEdgeElevationFt: 100, roadSide }, rules);
    expect(r.feasible).toBe(true);
    const check = checkEntrance({ profile: r.profile, roadSide }, rules);
    expect(check.findings.filter((f) => f.status === 'fail')).toEqual([]);
    expect(findingOf(check.findings, 'grade.road-edge-change').measured).toBeLessThanOrEqual(13 + 1e-6);
  });

  it('keeps the car clear over a crowned road and a shoulder falling to the edge', async () => {
    const rules = ruleProfile();
    const existing = profileFromRuns([
      [20, 4],
      [40, 12],
    ]);
    const roadSide = { roadCrossSlopePercent: 2, shoulderWidthFt: 6, shoulderSlopePercent: 8 };
    // 8% down the shoulder, then 4% up the landing: a 12% sag within the grade-change limit that the car's
    // overhang cannot clear, so the ground fails only on the scrape.
    const asFound = checkEntrance({ profile: existing, roadSide }, rules);
    expect(findingOf(asFound.findings, 'grade.road-edge-change').status).toBe('pass');
    expect(findingOf(asFound.findings, 'scrape.clearance').status).toBe('fail');
    const r = await proposeProfile({ existing, roadEdgeElevationFt: 100, roadSide }, rules);
    expect(r.feasible).toBe(true);
    const check = checkEntrance({ profile: r.profile, roadSide }, rules);
    expect(check.findings.filter((f) => f.status === 'fail')).toEqual([]);
  });

  it('says no design exists when the road edge break cannot be met within the landing limits', async () => {
    // Road 6% down to the edge and a landing that must rise at least 8%: 14% at the edge at best, over 13%.
    const rules = ruleProfile({ landing: { lengthFt: 20, minGradePercent: 8, maxGradePercent: 12 } });
    const r = await proposeProfile(
      {
        existing: profileFromRuns([
          [20, 10],
          [30, 10],
        ]),
        roadEdgeElevationFt: 100,
        roadSide: { roadCrossSlopePercent: 6 },
      },
      rules,
    );
    expect(r.feasible).toBe(false);
    expect(r.reason).toMatch(/road edge/);
  });
});
