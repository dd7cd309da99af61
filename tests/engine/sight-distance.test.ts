import { describe, expect, it } from 'vitest';
import { EngineInputError, intersectionSightDistance, stoppingSightDistance } from '@shared/engine';

// AASHTO Green Book values as reproduced in the Highway Engineering Handbook Table 2.2 and the TxDOT
// Roadway Design Manual 4.11.1 (docs/sources.md, "Sight distance").
const SSD_LEVEL_FT: [number, number][] = [
  [20, 115],
  [25, 155],
  [30, 200],
  [35, 250],
  [40, 305],
  [45, 360],
  [50, 425],
  [55, 495],
  [60, 570],
  [65, 645],
  [70, 730],
];

// Highway Engineering Handbook Table 2.3A / TxDOT RDM 13.5.2: passenger car from a stop, left / right.
const ISD_FT: [number, number, number][] = [
  [20, 225, 195],
  [25, 280, 240],
  [30, 335, 290],
  [35, 390, 335],
  [40, 445, 385],
  [45, 500, 430],
  [50, 555, 480],
  [55, 610, 530],
  [60, 665, 575],
  [65, 720, 625],
  [70, 775, 670],
];

describe('stopping sight distance (AASHTO, Highway Engineering Handbook Table 2.2)', () => {
  it.each(SSD_LEVEL_FT)('%i mph on level road: design %i ft', (speedMph, designFt) => {
    expect(stoppingSightDistance({ speedMph }).designFt).toBe(designFt);
  });

  it('40 mph: the grade form gives 300.3 ft, the rounded 1.075 constant 300.6 ft; both design to 305 ft (docs/sources.md)', () => {
    // One form throughout: 1.47 V t + V^2 / (30 (a/32.2 + G)), with G = 0 on a level road.
    const r = stoppingSightDistance({ speedMph: 40 });
    expect(r.computedFt).toBeCloseTo(147 + 1600 / (30 * (11.2 / 32.2)), 9);
    expect(Math.abs(r.computedFt - 300.6)).toBeLessThan(0.5);
    expect(r.designFt).toBe(305);
  });

  it('is continuous through a level road: a hair of grade either way changes the distance by a hair (AASHTO grade formula)', () => {
    for (const speedMph of [20, 40, 55, 70]) {
      const level = stoppingSightDistance({ speedMph, gradePercent: 0 }).computedFt;
      const up = stoppingSightDistance({ speedMph, gradePercent: 1e-6 }).computedFt;
      const down = stoppingSightDistance({ speedMph, gradePercent: -1e-6 }).computedFt;
      expect(Math.abs(up - level)).toBeLessThan(1e-3);
      expect(Math.abs(down - level)).toBeLessThan(1e-3);
      expect(down).toBeGreaterThan(level);
      expect(up).toBeLessThan(level);
    }
  });

  it('on a grade uses V^2 / (30 (a/32.2 + G)) (AASHTO grade formula)', () => {
    const up = stoppingSightDistance({ speedMph: 50, gradePercent: 5 });
    const down = stoppingSightDistance({ speedMph: 50, gradePercent: -5 });
    const expected = (g: number) => 1.47 * 50 * 2.5 + 2500 / (30 * (11.2 / 32.2 + g));
    expect(up.computedFt).toBeCloseTo(expected(0.05), 9);
    expect(down.computedFt).toBeCloseTo(expected(-0.05), 9);
    expect(down.computedFt).toBeGreaterThan(stoppingSightDistance({ speedMph: 50 }).computedFt);
    expect(up.designFt % 5).toBe(0);
  });

  it('refuses a downgrade steeper than the braking rate can hold instead of returning a negative distance', () => {
    expect(() => stoppingSightDistance({ speedMph: 40, gradePercent: -15, decelFtPerS2: 3 })).toThrow(/gradePercent/);
  });

  it('refuses a speed outside the accepted range with the typed error', () => {
    expect(() => stoppingSightDistance({ speedMph: Number.NaN })).toThrow(EngineInputError);
    try {
      stoppingSightDistance({ speedMph: Infinity });
    } catch (e) {
      expect((e as EngineInputError).field).toBe('speedMph');
    }
  });
});

describe('intersection sight distance (AASHTO, Highway Engineering Handbook Table 2.3A)', () => {
  it.each(ISD_FT)('%i mph: left %i ft, right %i ft', (speedMph, leftFt, rightFt) => {
    expect(intersectionSightDistance({ speedMph, turn: 'left' }).designFt).toBe(leftFt);
    expect(intersectionSightDistance({ speedMph, turn: 'right' }).designFt).toBe(rightFt);
  });

  it('time gaps 7.5 / 6.5 s passenger, 9.5 / 8.5 single-unit, 11.5 / 10.5 combination (AASHTO)', () => {
    const gap = (vehicle: 'passenger' | 'single-unit' | 'combination', turn: 'left' | 'right') =>
      intersectionSightDistance({ speedMph: 45, turn, vehicle }).timeGapS;
    expect([gap('passenger', 'left'), gap('passenger', 'right')]).toEqual([7.5, 6.5]);
    expect([gap('single-unit', 'left'), gap('single-unit', 'right')]).toEqual([9.5, 8.5]);
    expect([gap('combination', 'left'), gap('combination', 'right')]).toEqual([11.5, 10.5]);
  });

  it('adds 0.5 s per extra lane for cars and 0.7 s for trucks (AASHTO)', () => {
    expect(intersectionSightDistance({ speedMph: 45, turn: 'left', extraLanes: 1 }).timeGapS).toBeCloseTo(8.0, 9);
    expect(
      intersectionSightDistance({ speedMph: 45, turn: 'left', vehicle: 'combination', extraLanes: 2 }).timeGapS,
    ).toBeCloseTo(12.9, 9);
  });

  it('approach grades of 3% or less need no adjustment (AASHTO)', () => {
    expect(intersectionSightDistance({ speedMph: 55, turn: 'left', approachGradePercent: 3 }).timeGapS).toBe(7.5);
  });

  it('above 3%, +0.2 s per percent left and +0.1 s right, counted on the part above 3% by default (AASHTO)', () => {
    expect(intersectionSightDistance({ speedMph: 55, turn: 'left', approachGradePercent: 5 }).timeGapS).toBeCloseTo(
      7.9,
      9,
    );
    expect(intersectionSightDistance({ speedMph: 55, turn: 'right', approachGradePercent: 5 }).timeGapS).toBeCloseTo(
      6.7,
      9,
    );
  });

  it('the whole-grade reading, a rule-profile choice, counts every percent once past 3% (AASHTO, literal wording)', () => {
    const whole = (turn: 'left' | 'right') =>
      intersectionSightDistance({ speedMph: 55, turn, approachGradePercent: 5, gradeReading: 'whole-grade' }).timeGapS;
    expect(whole('left')).toBeCloseTo(8.5, 9);
    expect(whole('right')).toBeCloseTo(7.0, 9);
  });

  it('the default reading has no jump at 3%: a hundredth of a percent more adds a few thousandths of a second', () => {
    for (const turn of ['left', 'right'] as const) {
      const at = intersectionSightDistance({ speedMph: 55, turn, approachGradePercent: 3 });
      const past = intersectionSightDistance({ speedMph: 55, turn, approachGradePercent: 3.01 });
      expect(past.timeGapS - at.timeGapS).toBeGreaterThan(0);
      expect(past.timeGapS - at.timeGapS).toBeLessThanOrEqual(0.002 + 1e-12);
    }
  });
});
