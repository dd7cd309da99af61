import { describe, expect, it } from 'vitest';
import { demoJurisdictions } from '../../server/dev/seed/jurisdictions';
import { plainSummary } from '../../server/services/grade-checks/plain-summary';
import { parseGradeCheckInputs, runGradeCheck } from '../../server/services/grade-checks/run-grade-check';
import { proposeProfile, ruleProfileSchema } from '@shared/engine';

const marrow = {
  ...ruleProfileSchema.parse(demoJurisdictions[0].profile),
  id: 'v1',
  version: 1,
  jurisdictionName: 'Marrow County',
};
const steepBeyond = [
  { stationFt: 0, elevationFt: 100 },
  { stationFt: 20, elevationFt: 100.6 },
  { stationFt: 40, elevationFt: 104.6 },
  { stationFt: 80, elevationFt: 110 },
];

async function summaryFor(ground: typeof steepBeyond, apply: boolean) {
  const design = { existing: ground, roadEdgeElevationFt: 100 };
  const proposal = await proposeProfile(design, marrow);
  const raw = {
    profile: apply ? proposal.profile : ground,
    roadEdgeStationFt: 0,
    design: { ...design, applied: apply },
  };
  const inputs = parseGradeCheckInputs(raw);
  const results = await runGradeCheck(inputs, marrow, proposeProfile);
  return { text: plainSummary(inputs, results, marrow), results };
}

describe('the words the homeowner reads', async () => {
  it('says what fails when the entrance as checked does not meet the rules', async () => {
    const { text } = await summaryFor(steepBeyond, false);
    expect(text).toBe(
      "The entrance as checked does not yet meet Marrow County's rules (version 1): driveway grade beyond the landing at station 0+20; grade change at a break at station 0+20; clearance under a passenger car at station 0+14.93. We will be in touch about what it needs.",
    );
  });

  it('names regrading rather than the landing when the trouble is beyond it, and gives the proposal', async () => {
    const { text, results } = await summaryFor(steepBeyond, true);
    expect(results.report.passes).toBe(true);
    expect(text).toMatch(
      /^The ground as it is now needs regrading \(driveway grade beyond the landing at station 0\+20; grade change at a break at station 0\+20; clearance under a passenger car at station 0\+14\.93\): here is what we propose\. A landing no steeper than [\d.]+% for the first 20 ft from the road edge, then no more than ([\d.]+)% up to the end of the survey at 0\+80\./,
    );
    const steepest = Number(/then no more than ([\d.]+)%/.exec(text)?.[1]);
    expect(steepest).toBeLessThanOrEqual(15);
    expect(text).toMatch(
      /It moves about \d+ cu yd of cut and \d+ cu yd of fill\. The proposed entrance meets Marrow County's rules \(version 1\)\.$/,
    );
  });

  it('says plainly that a compliant entrance meets the rules', async () => {
    const gentle = [
      { stationFt: 0, elevationFt: 100 },
      { stationFt: 20, elevationFt: 100.6 },
      { stationFt: 60, elevationFt: 104.6 },
    ];
    expect((await summaryFor(gentle, false)).text).toBe(
      "Your entrance meets Marrow County's rules (version 1): a landing no steeper than 3% for the first 20 ft from the road edge, then no more than 10% up to the end of the survey at 0+60.",
    );
  });
});
