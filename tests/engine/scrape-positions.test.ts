import { describe, expect, it } from 'vitest';
import { scrapeCheck } from '@shared/engine';

const vehicle = { name: 'Test car', wheelbaseFt: 11, frontOverhangFt: 3, rearOverhangFt: 5, clearanceIn: 5 };

/** A crest at `breakFt` from +a/2 % to -a/2 %, on 100 ft of profile. */
const crestAt = (breakFt: number, a: number) => [
  { stationFt: 0, elevationFt: 100 - (breakFt * a) / 200 },
  { stationFt: breakFt, elevationFt: 100 },
  { stationFt: 100, elevationFt: 100 - ((100 - breakFt) * a) / 200 },
];

// A crest of algebraic difference A loses about A W / 4 of clearance between the axles, the most when the break
// is halfway between them (docs/sources.md, "Vertical transitions": small-angle geometry).
describe('scrape positions include every vertex event, so the step cannot hide a crest', () => {
  it('a 10% crest at 0+60.50 read with 10 ft steps matches the fine reading, where the grid alone was 1.7 in optimistic', () => {
    const coarse = scrapeCheck({ profile: crestAt(60.5, 10), vehicle, stepFt: 10 });
    const fine = scrapeCheck({ profile: crestAt(60.5, 10), vehicle, stepFt: 0.01 });
    expect(Math.abs(coarse.minClearanceIn - fine.minClearanceIn)).toBeLessThan(0.01);
    expect(coarse.minClearanceIn).toBeCloseTo(5 - (0.1 * 11 * 12) / 4, 1);
    expect(coarse.atStationFt).toBeCloseTo(60.5, 1);
  });

  it('the answer does not depend on the step for crests anywhere along the grid', () => {
    for (const breakFt of [40.3, 47.77, 55, 58.9, 61.25]) {
      const fine = scrapeCheck({ profile: crestAt(breakFt, 8), vehicle, stepFt: 0.01 }).minClearanceIn;
      for (const stepFt of [0.5, 2.5, 7, 10]) {
        expect(
          Math.abs(scrapeCheck({ profile: crestAt(breakFt, 8), vehicle, stepFt }).minClearanceIn - fine),
          `${breakFt} at ${stepFt}`,
        ).toBeLessThan(0.01);
      }
    }
  });

  it('a short hump between two grid positions is still found under the front overhang', () => {
    // A 0.4 ft hump 1 ft long; a long nose meets it going in.
    const hump = [
      { stationFt: 0, elevationFt: 100 },
      { stationFt: 33.2, elevationFt: 100 },
      { stationFt: 33.7, elevationFt: 100.4 },
      { stationFt: 34.2, elevationFt: 100 },
      { stationFt: 80, elevationFt: 100 },
    ];
    const fine = scrapeCheck({ profile: hump, vehicle, stepFt: 0.01 });
    const coarse = scrapeCheck({ profile: hump, vehicle, stepFt: 10 });
    expect(fine.minClearanceIn).toBeLessThan(0.5);
    expect(Math.abs(coarse.minClearanceIn - fine.minClearanceIn)).toBeLessThan(0.01);
  });
});
