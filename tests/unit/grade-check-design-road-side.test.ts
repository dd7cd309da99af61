import { describe, expect, it } from 'vitest';
import { checkEntrance, commonRuralTemplate, proposeProfile } from '@shared/engine';
import { runGradeCheck } from '@shared/grade-check/run-check';
import { gradeCheckInputsSchema } from '@shared/contracts/grade-checks';
import { profileFromRuns } from '../engine/fixtures';

// The check's one run hands the road side the office typed to the design proposal, so a proposal the screen offers
// is judged by the same road-edge break the check itself applies. Limits: the common rural template (common practice
// (no source)) with a steeper landing, as in tests/engine/propose-road-side.test.ts.
describe('the design proposal inside a grade check', () => {
  it('meets the break at the road edge the check was given: road 3% down to the edge, ground rising 11%', async () => {
    const rules = { ...commonRuralTemplate, landing: { lengthFt: 20, minGradePercent: -12, maxGradePercent: 12 } };
    const existing = profileFromRuns([
      [20, 11],
      [30, 11],
    ]);
    const inputs = gradeCheckInputsSchema.parse({
      profile: existing,
      roadSide: { roadCrossSlopePercent: 3 },
      design: { existing, roadEdgeElevationFt: 100 },
    });
    const results = await runGradeCheck(inputs, rules, proposeProfile);
    expect(results.proposal?.feasible).toBe(true);
    const judged = checkEntrance({ profile: results.proposal!.profile, roadSide: inputs.roadSide }, rules);
    expect(judged.findings.find((f) => f.ruleId === 'grade.road-edge-change')?.status).toBe('pass');
  });
});
