import { describe, expect, it } from 'vitest';
import {
  checkAsBuilt,
  checkEntrance,
  commonRuralTemplate,
  EngineInputError,
  normalizeProfile,
  STATION_TOLERANCE_FT,
} from '@shared/engine';
import { findingOf } from './fixtures';

// Landing 4% for 20 ft, 17% beyond: common practice (no source). Stations to 0.01 ft: common survey practice (no source).
const highCar = { name: 'High car', wheelbaseFt: 11, frontOverhangFt: 0, rearOverhangFt: 0, clearanceIn: 30 };
const hundredths = (ft: number) => Number(ft.toFixed(2));

describe('one station tolerance, the survey precision of 0.01 ft (common practice (no source))', () => {
  it('is stated once and exported for the design model', () => {
    expect(STATION_TOLERANCE_FT).toBe(0.01);
  });

  it('a break typed at road edge + 20 ft with any two-decimal road-edge offset is the landing end', () => {
    const failures: number[] = [];
    for (let i = 1; i < 1000; i++) {
      const edge = i / 100;
      const end = hundredths(edge + 20);
      const profile = [
        { stationFt: edge, elevationFt: 100 },
        { stationFt: end, elevationFt: 100.8 },
        { stationFt: end + 40, elevationFt: 100.8 + 0.15 * 40 },
      ];
      const f = checkEntrance({ profile, roadEdgeStationFt: edge, vehicle: highCar }, commonRuralTemplate).findings;
      if (findingOf(f, 'landing.max-grade').status !== 'pass' || findingOf(f, 'grade.max').status !== 'pass')
        failures.push(edge);
    }
    expect(failures).toEqual([]);
  });

  it('digital-level segments that add up to a hair under the landing length end the landing', () => {
    // 4 + 4.72 + 4.56 + 6.72 is 19.999999999999996 in binary floating point.
    const segments = [4, 4.72, 4.56, 6.72].map((lengthFt) => ({ lengthFt, gradePercent: 2 }));
    const profile = {
      kind: 'segment-grades' as const,
      startElevationFt: 100,
      segments: [...segments, { lengthFt: 40, gradePercent: 15 }],
    };
    const f = checkEntrance({ profile, vehicle: highCar }, commonRuralTemplate).findings;
    expect(findingOf(f, 'landing.max-grade').status).toBe('pass');
    expect(findingOf(f, 'grade.max')).toMatchObject({ status: 'pass', measured: expect.closeTo(15, 9) });
  });

  it('the as-built check puts a reading typed at the landing end beyond the landing', () => {
    const r = checkAsBuilt({
      ruleProfile: commonRuralTemplate,
      roadEdgeStationFt: 2.24,
      readings: [{ stationFt: 22.24, gradePercent: 15 }],
    });
    expect(r.readings.map((x) => [x.ruleId, x.status])).toEqual([['grade.max', 'pass']]);
  });
});

describe('near-duplicate stations and a road edge off the survey', () => {
  it('refuses two shots closer than 0.01 ft with different elevations, naming the shot as typed', () => {
    const profile = [
      { stationFt: 0, elevationFt: 100 },
      { stationFt: 20.00001, elevationFt: 100.9 },
      { stationFt: 20, elevationFt: 100.8 },
      { stationFt: 60, elevationFt: 106 },
    ];
    try {
      checkEntrance({ profile }, commonRuralTemplate);
      expect.unreachable('should refuse');
    } catch (e) {
      expect(e).toBeInstanceOf(EngineInputError);
      // The shot typed second is the repeat, so it is the one named.
      expect((e as EngineInputError).field).toBe('profile.2.stationFt');
      expect((e as EngineInputError).message).toMatch(/closer than 0\.01 ft/);
    }
  });

  it('merges two shots closer than 0.01 ft that agree in elevation to 0.01 ft', () => {
    const points = normalizeProfile([
      { stationFt: 0, elevationFt: 100 },
      { stationFt: 20, elevationFt: 100.8 },
      { stationFt: 20.004, elevationFt: 100.805 },
      { stationFt: 60, elevationFt: 106 },
    ]);
    expect(points).toHaveLength(3);
    expect(points[1].stationFt).toBeCloseTo(20.002, 9);
    expect(points[1].elevationFt).toBeCloseTo(100.8025, 9);
  });

  it('refuses a digital-level segment shorter than 0.01 ft, naming the segment', () => {
    const profile = {
      kind: 'segment-grades' as const,
      startElevationFt: 100,
      segments: [
        { lengthFt: 20, gradePercent: 2 },
        { lengthFt: 0.00001, gradePercent: 50 },
        { lengthFt: 20, gradePercent: 5 },
      ],
    };
    expect(() => normalizeProfile(profile)).toThrow(/profile\.segments\.1\.lengthFt/);
  });

  it('refuses a road edge at or past the end of the survey instead of passing it', () => {
    const profile = [
      { stationFt: 0, elevationFt: 100 },
      { stationFt: 60, elevationFt: 103 },
    ];
    expect(() => checkEntrance({ profile, roadEdgeStationFt: 80 }, commonRuralTemplate)).toThrow(
      /^roadEdgeStationFt: .*past the end of the survey/,
    );
    expect(() => checkEntrance({ profile, roadEdgeStationFt: 60 }, commonRuralTemplate)).toThrow(EngineInputError);
  });
});
