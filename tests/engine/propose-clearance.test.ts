import { describe, expect, it } from 'vitest';
import { commonRuralTemplate, proposeProfile, scrapeCheck } from '@shared/engine';
import { earthBetween, independentOptimum } from './clearance-optimum';
import { profileFromRuns } from './fixtures';

// The common rural template (common practice, no source) and its passenger car: 11 ft wheelbase, 3 ft and
// 5 ft overhangs (from memory), 5 in clearance (Eck and Kang, TRR 1356).
const rules = commonRuralTemplate;
const vehicle = rules.designVehicle;

describe('clearance per break, with transitions where they are cheaper', () => {
  const cases: [string, [number, number][]][] = [
    [
      'a level landing breaking into a 17% climb',
      [
        [20, 0],
        [60, 17],
      ],
    ],
    [
      'a landing rising into a 3.4% step and then 15.4%',
      [
        [20, 4],
        [10, 17],
        [50, 15.4],
      ],
    ],
  ];
  for (const [name, runs] of cases) {
    it(`moves no more than 1.25 times the earth of an independent search, and clears: ${name}`, async () => {
      const ground = profileFromRuns(runs);
      const optimum = await independentOptimum({
        ground,
        roadEdgeFt: 100,
        landingFt: 20,
        landingMaxPercent: 4,
        maxPercent: 17,
        maxChangePercent: 13,
        vehicle,
        stepFt: 0.5,
      });
      expect(scrapeCheck({ profile: optimum, vehicle }).passes).toBe(true);
      const r = await proposeProfile({ existing: ground, roadEdgeElevationFt: 100 }, rules);
      expect(r.feasible).toBe(true);
      const scrape = scrapeCheck({ profile: r.profile, vehicle, stepFt: 0.05 });
      expect(scrape.minClearanceIn).toBeGreaterThanOrEqual(0);
      expect(earthBetween(ground, r.profile)).toBeLessThanOrEqual(1.25 * earthBetween(ground, optimum));
    });
  }

  it('bends through extra stations (a short vertical curve) where one sharp break would need more earth', async () => {
    const ground = profileFromRuns([
      [20, 0],
      [60, 17],
    ]);
    const r = await proposeProfile({ existing: ground, roadEdgeElevationFt: 100 }, rules);
    const surveyed = new Set(ground.map((p) => p.stationFt));
    const added = r.profile.filter((p) => !surveyed.has(p.stationFt));
    expect(added.length).toBeGreaterThan(2);
  });
});
