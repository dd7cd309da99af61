import { describe, expect, it } from 'vitest';
import {
  EngineInputError,
  formatStation,
  gradeBreaks,
  normalizeProfile,
  parseStation,
  segmentGrades,
} from '@shared/engine';

describe('station notation (trade practice: hundreds + feet)', () => {
  it.each([
    [20, '0+20'],
    [0, '0+00'],
    [125.5, '1+25.5'],
    [100, '1+00'],
    [1234.56, '12+34.56'],
    [99.999, '1+00'],
    [-20, '-0+20'],
  ])('%f ft -> %s', (ft, text) => {
    expect(formatStation(ft)).toBe(text);
  });

  it('parses what it formats, and plain feet', () => {
    for (const ft of [0, 20, 125.5, 1234.56, -20]) expect(parseStation(formatStation(ft))).toBeCloseTo(ft, 9);
    expect(parseStation('45.5')).toBe(45.5);
  });

  it('refuses text that is not a station', () => {
    expect(() => parseStation('1+5')).toThrow(EngineInputError);
    expect(() => parseStation('0+120')).toThrow(EngineInputError);
    expect(() => parseStation('twenty')).toThrow(/not a station/);
  });
});

describe('profile input forms', () => {
  it('rod readings become elevations as HI - rod', () => {
    const points = normalizeProfile({
      kind: 'rod-readings',
      instrumentHeightFt: 105.2,
      readings: [
        { stationFt: 0, rodFt: 5.2 },
        { stationFt: 20, rodFt: 4.4 },
      ],
    });
    expect(points[0].elevationFt).toBeCloseTo(100, 9);
    expect(points[1].elevationFt).toBeCloseTo(100.8, 9);
  });

  it('segment grades from a digital level rebuild the elevations', () => {
    const points = normalizeProfile({
      kind: 'segment-grades',
      startElevationFt: 100,
      segments: [
        { lengthFt: 20, gradePercent: 4 },
        { lengthFt: 30, gradePercent: -10 },
      ],
    });
    expect(points.map((p) => p.stationFt)).toEqual([0, 20, 50]);
    expect(points[2].elevationFt).toBeCloseTo(100 + 0.8 - 3, 9);
    expect(segmentGrades(points).map((s) => s.gradePercent)).toEqual([expect.closeTo(4, 9), expect.closeTo(-10, 9)]);
  });

  it('sorts unsorted shots and merges an exact repeat', () => {
    const points = normalizeProfile([
      { stationFt: 40, elevationFt: 103 },
      { stationFt: 0, elevationFt: 100 },
      { stationFt: 20, elevationFt: 101 },
      { stationFt: 20, elevationFt: 101 },
    ]);
    expect(points.map((p) => p.stationFt)).toEqual([0, 20, 40]);
  });

  it('refuses the same station with two elevations, naming the field and the station', () => {
    try {
      normalizeProfile([
        { stationFt: 0, elevationFt: 100 },
        { stationFt: 20, elevationFt: 101 },
        { stationFt: 20, elevationFt: 101.5 },
      ]);
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(EngineInputError);
      expect((e as EngineInputError).field).toBe('profile.2.stationFt');
      expect((e as Error).message).toMatch(/0\+20 appears twice/);
    }
  });

  it('names the exact bad value in a long profile', () => {
    const shots = [
      { stationFt: 0, elevationFt: 100 },
      { stationFt: 10, elevationFt: Number.NaN },
    ];
    expect(() => normalizeProfile(shots)).toThrow(EngineInputError);
    try {
      normalizeProfile(shots);
    } catch (e) {
      expect((e as EngineInputError).issues.some((i) => i.field === 'profile.1.elevationFt')).toBe(true);
    }
  });

  it('grade breaks are the algebraic difference, next minus previous', () => {
    const points = normalizeProfile([
      { stationFt: 0, elevationFt: 100 },
      { stationFt: 20, elevationFt: 100.8 },
      { stationFt: 40, elevationFt: 103.8 },
    ]);
    const [b] = gradeBreaks(segmentGrades(points));
    expect(b.stationFt).toBe(20);
    expect(b.changePercent).toBeCloseTo(11, 9);
  });
});
