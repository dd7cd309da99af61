import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  checkEntrance,
  commonRuralTemplate,
  scrapeCheck,
  STATION_TOLERANCE_FT,
  type RuleProfile,
} from '@shared/engine';

// Properties of the check itself, not against a published value: geometry and the survey's 0.01 ft precision
// (docs/sources.md, "Survey precision": common practice (no source)).

/** Runs typed to the hundredth, as a surveyor would: lengths 1..30 ft, grades -15..15 %. */
const typedRuns = fc.array(fc.tuple(fc.integer({ min: 100, max: 3000 }), fc.integer({ min: -1500, max: 1500 })), {
  minLength: 2,
  maxLength: 10,
});

const profileOf = (runs: [number, number][], shiftFt = 0) => {
  const points = [{ stationFt: shiftFt, elevationFt: 100 }];
  let station = 0;
  for (const [len, grade] of runs) {
    const last = points[points.length - 1];
    station += len;
    points.push({ stationFt: station / 100 + shiftFt, elevationFt: last.elevationFt + ((len / 100) * grade) / 10000 });
  }
  return points;
};

const vehicleArb = fc.record({
  name: fc.constant('Any car'),
  wheelbaseFt: fc.double({ min: 8, max: 14, noNaN: true }),
  frontOverhangFt: fc.double({ min: 0, max: 5, noNaN: true }),
  rearOverhangFt: fc.double({ min: 0, max: 6, noNaN: true }),
  clearanceIn: fc.double({ min: 3, max: 8, noNaN: true }),
});

const rulesArb: fc.Arbitrary<RuleProfile> = fc
  .record({
    lengthFt: fc.integer({ min: 0, max: 30 }),
    landingMax: fc.integer({ min: 2, max: 10 }),
    maxGrade: fc.integer({ min: 8, max: 20 }),
    drain: fc.option(fc.constantFrom(0.5, 1, 2), { nil: undefined }),
  })
  .map((r) => ({
    ...commonRuralTemplate,
    landing: { lengthFt: r.lengthFt, minGradePercent: -r.landingMax, maxGradePercent: r.landingMax },
    maxGradePercent: r.maxGrade,
    minDrainageGradePercent: r.drain,
  }));

describe('check properties (fast-check)', () => {
  it('the scrape clearance is the same driving in and driving out: a profile and its mirror agree', () => {
    fc.assert(
      fc.property(typedRuns, vehicleArb, (runs, vehicle) => {
        const profile = profileOf(runs);
        const end = profile[profile.length - 1].stationFt;
        const mirror = profile.map((p) => ({ stationFt: end - p.stationFt, elevationFt: p.elevationFt })).reverse();
        const there = scrapeCheck({ profile, vehicle, stepFt: 0.5 });
        const back = scrapeCheck({ profile: mirror, vehicle, stepFt: 0.5 });
        expect(back.positionsChecked === 0).toBe(there.positionsChecked === 0);
        // A hundredth of an inch: far below anything a car or a survey can tell apart.
        expect(Math.abs(back.minClearanceIn - there.minClearanceIn)).toBeLessThan(0.01);
      }),
      { numRuns: 120 },
    );
  });

  it('moving every shot by less than half the station tolerance never flips a result', () => {
    const half = STATION_TOLERANCE_FT / 2;
    fc.assert(
      fc.property(
        typedRuns,
        rulesArb,
        fc.double({ min: -half * 0.98, max: half * 0.98, noNaN: true }),
        (runs, rules, shift) => {
          const statuses = (shiftFt: number) =>
            checkEntrance(
              { profile: profileOf(runs, shiftFt), roadEdgeStationFt: 0, scrapeStepFt: 0.5 },
              rules,
            ).findings.map((f) => `${f.ruleId}:${f.status}`);
          expect(statuses(shift)).toEqual(statuses(0));
        },
      ),
      { numRuns: 150 },
    );
  });
});
