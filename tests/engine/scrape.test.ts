import { describe, expect, it } from 'vitest';
import {
  breakOverAngleDeg,
  EngineInputError,
  gradePercentToDegrees,
  passengerCarPreset,
  scrapeCheck,
} from '@shared/engine';

const vehicle = { name: 'Test car', wheelbaseFt: 11, frontOverhangFt: 3, rearOverhangFt: 5, clearanceIn: 5 };

/** A single grade break at station 50 between grades g1 and g2 (percent). */
const singleBreak = (g1: number, g2: number) => [
  { stationFt: 0, elevationFt: 100 - 0.5 * g1 },
  { stationFt: 50, elevationFt: 100 },
  { stationFt: 100, elevationFt: 100 + 0.5 * g2 },
];

describe('percent grade to angle: atan(g/100) (docs/sources.md, "Grades and vehicles")', () => {
  it.each([
    [5, 2.862],
    [8, 4.574],
    [10, 5.711],
    [12, 6.843],
    [15, 8.531],
    [20, 11.31],
  ])('%i%% = %f deg', (g, deg) => {
    expect(gradePercentToDegrees(g)).toBeCloseTo(deg, 3);
  });
});

describe('scrape check', () => {
  it.each([2, 4, 6, 8, 10])(
    'a single %i%% crest loses A*W/4 at mid-wheelbase (docs/sources.md, "Vertical transitions")',
    (a) => {
      const r = scrapeCheck({ profile: singleBreak(a / 2, -a / 2), vehicle });
      const lossIn = ((a / 100) * 11 * 12) / 4;
      // The small-angle rule and the exact chord agree to well under a hundredth of an inch at these grades.
      expect(r.minClearanceIn).toBeCloseTo(5 - lossIn, 1);
      expect(r.where).toBe('between-axles');
      expect(r.atStationFt).toBeCloseTo(50, 6);
    },
  );

  it('a crest at the break-over angle 2 atan(2h/W) just touches (Eck and Kang, TRR 1356)', () => {
    const angle = breakOverAngleDeg({ clearanceIn: 5, wheelbaseFt: 11 });
    const half = Math.tan(((angle / 2) * Math.PI) / 180) * 100;
    const r = scrapeCheck({ profile: singleBreak(half, -half), vehicle, stepFt: 0.01 });
    expect(Math.abs(r.minClearanceIn)).toBeLessThan(0.001);
  });

  it('a flat profile keeps the full clearance', () => {
    const r = scrapeCheck({
      profile: [
        { stationFt: 0, elevationFt: 10 },
        { stationFt: 60, elevationFt: 10 },
      ],
      vehicle,
    });
    expect(r.minClearanceIn).toBeCloseTo(5, 9);
    expect(r.passes).toBe(true);
  });

  it('a sag catches the longer rear overhang going in, where the front overhang alone would clear', () => {
    // 8% sag: rear overhang 5 ft x tan(change) ~ 4.8 in, front 3 ft ~ 2.9 in; geometry, not a published value.
    const r = scrapeCheck({ profile: singleBreak(0, 8), vehicle });
    expect(r.where).toBe('rear-overhang');
    expect(r.direction).toBe('into-property');
    const theta = Math.atan(0.08);
    expect(r.minClearanceIn).toBeCloseTo(5 - 5 * Math.tan(theta) * 12, 1);
    const frontOnly = scrapeCheck({ profile: singleBreak(0, 8), vehicle: { ...vehicle, rearOverhangFt: 0 } });
    expect(frontOnly.where).toBe('front-overhang');
    expect(frontOnly.minClearanceIn).toBeCloseTo(5 - 3 * Math.tan(theta) * 12, 1);
  });

  it('drives both ways: the same step is worst going in on one profile and coming out on its mirror', () => {
    // A short 0.3 ft ramp up at 0+50: a long front overhang meets it going in, not coming out.
    const step = [
      { stationFt: 0, elevationFt: 100 },
      { stationFt: 50, elevationFt: 100 },
      { stationFt: 52, elevationFt: 100.3 },
      { stationFt: 100, elevationFt: 100.3 },
    ];
    const mirror = step.map((p) => ({ stationFt: 100 - p.stationFt, elevationFt: p.elevationFt })).reverse();
    const longNose = { ...vehicle, frontOverhangFt: 5, rearOverhangFt: 1 };
    const going = scrapeCheck({ profile: step, vehicle: longNose });
    const coming = scrapeCheck({ profile: mirror, vehicle: longNose });
    expect(going).toMatchObject({ direction: 'into-property', where: 'front-overhang' });
    expect(coming).toMatchObject({ direction: 'out-of-property', where: 'front-overhang' });
    expect(coming.minClearanceIn).toBeCloseTo(going.minClearanceIn, 6);
    expect(coming.atStationFt).toBeCloseTo(100 - going.atStationFt, 6);
  });

  it('reports failure below zero clearance and where it happens', () => {
    const r = scrapeCheck({ profile: singleBreak(9, -9), vehicle: passengerCarPreset });
    expect(r.passes).toBe(false);
    expect(r.minClearanceIn).toBeLessThan(0);
  });

  it('a profile shorter than the wheelbase checks no positions', () => {
    const r = scrapeCheck({
      profile: [
        { stationFt: 0, elevationFt: 0 },
        { stationFt: 8, elevationFt: 0 },
      ],
      vehicle,
    });
    expect(r.positionsChecked).toBe(0);
  });

  it('refuses a zero step with the typed error', () => {
    expect(() => scrapeCheck({ profile: singleBreak(0, 5), vehicle, stepFt: 0 })).toThrow(EngineInputError);
  });
});
