import { describe, expect, it } from 'vitest';
import { checkAsBuilt, classifyAsBuiltReading, commonRuralTemplate, EngineInputError } from '@shared/engine';
import { ruleProfile } from './fixtures';

// Limits from the common rural template (common practice (no source), docs/sources.md "Grades and vehicles"); an
// as-built tolerance is whatever the road authority states, so the ones here are test values, not published ones.
describe('as-built reading classification', () => {
  it('exactly at the limit passes', () => {
    expect(classifyAsBuiltReading({ measured: 17, limit: 17, tolerance: 0.5, kind: 'max' }).status).toBe('pass');
    expect(classifyAsBuiltReading({ measured: 0.1 + 0.2, limit: 0.3, tolerance: 0, kind: 'max' }).status).toBe('pass');
  });

  it('beyond the limit but within tolerance is advisory, including exactly at limit + tolerance', () => {
    expect(classifyAsBuiltReading({ measured: 17.3, limit: 17, tolerance: 0.5, kind: 'max' }).status).toBe('advisory');
    expect(classifyAsBuiltReading({ measured: 17.5, limit: 17, tolerance: 0.5, kind: 'max' }).status).toBe('advisory');
  });

  it('0.01 beyond limit + tolerance fails', () => {
    expect(classifyAsBuiltReading({ measured: 17.51, limit: 17, tolerance: 0.5, kind: 'max' }).status).toBe('fail');
    expect(classifyAsBuiltReading({ measured: -4.51, limit: -4, tolerance: 0.5, kind: 'min' }).status).toBe('fail');
  });

  it('minimum limits work the other way round', () => {
    expect(classifyAsBuiltReading({ measured: -4, limit: -4, tolerance: 0.5, kind: 'min' }).status).toBe('pass');
    expect(classifyAsBuiltReading({ measured: -4.2, limit: -4, tolerance: 0.5, kind: 'min' }).status).toBe('advisory');
  });

  it('refuses a negative tolerance with the typed error', () => {
    expect(() => classifyAsBuiltReading({ measured: 1, limit: 1, tolerance: -1, kind: 'max' })).toThrow(
      EngineInputError,
    );
  });
});

describe('as-built check along the centreline', () => {
  // Tolerances here are test values an admin might enter, not from any published code.
  const rules = ruleProfile({ asBuilt: { gradeTolerancePercent: 0.5, elevationToleranceFt: 0.1 } });

  it('with no tolerance in the rule profile, anything past the limit fails', () => {
    const r = checkAsBuilt({ ruleProfile: commonRuralTemplate, readings: [{ stationFt: 40, gradePercent: 17.01 }] });
    expect(r.readings[0].status).toBe('fail');
  });

  it('checks digital-level grades against the landing and the maximum by station', () => {
    const r = checkAsBuilt({
      ruleProfile: rules,
      readings: [
        { stationFt: 5, gradePercent: 4 },
        { stationFt: 15, gradePercent: 4.3 },
        { stationFt: 40, gradePercent: 17.51 },
      ],
    });
    expect(r.readings.map((x) => [x.ruleId, x.status])).toEqual([
      ['landing.max-grade', 'pass'],
      ['landing.max-grade', 'advisory'],
      ['grade.max', 'fail'],
    ]);
    expect(r.passes).toBe(false);
  });

  it('turns elevation shots into grades and holds them to the design elevation tolerance', () => {
    const r = checkAsBuilt({
      ruleProfile: rules,
      readings: [
        { stationFt: 0, elevationFt: 100 },
        { stationFt: 20, elevationFt: 100.8 },
        { stationFt: 40, elevationFt: 104.2 },
      ],
      design: [
        { stationFt: 0, elevationFt: 100 },
        { stationFt: 20, elevationFt: 100.8 },
        { stationFt: 40, elevationFt: 104.1 },
      ],
    });
    const grades = r.readings.filter((x) => x.ruleId.startsWith('landing.') || x.ruleId === 'grade.max');
    expect(grades.map((x) => x.status)).toEqual(['pass', 'pass']);
    const elevations = r.readings.filter((x) => x.ruleId === 'as-built.elevation');
    // 104.2 against 104.1 is exactly the 0.1 ft tolerance: at the limit passes.
    expect(elevations.map((x) => x.status)).toEqual(['pass', 'pass', 'pass']);
    expect(r.status).toBe('pass');
  });

  it('holds grades beyond the landing to the drainage minimum (common practice (no source) for the 1% value)', () => {
    const drained = ruleProfile({ minDrainageGradePercent: 1 });
    const r = checkAsBuilt({
      ruleProfile: drained,
      readings: [
        { stationFt: 30, gradePercent: 0.5 },
        { stationFt: 50, gradePercent: -1.2 },
      ],
    });
    expect(r.readings.filter((x) => x.ruleId === 'grade.min-drainage').map((x) => [x.stationFt, x.status])).toEqual([
      [30, 'fail'],
      [50, 'pass'],
    ]);
    expect(r.passes).toBe(false);
  });

  it('holds the change of grade at each elevation shot to the grade-change limit', () => {
    // The template's 13% break limit (17 - 4), with no tolerance.
    const r = checkAsBuilt({
      ruleProfile: commonRuralTemplate,
      readings: [
        { stationFt: 0, elevationFt: 100 },
        { stationFt: 20, elevationFt: 99.2 },
        { stationFt: 40, elevationFt: 101.2 },
        { stationFt: 60, elevationFt: 104.5 },
      ],
    });
    // -4% then 10% is a 14% break at 0+20; 10% then 16.5% is 6.5% at 0+40.
    const changes = r.readings.filter((x) => x.ruleId === 'grade.max-change');
    expect(changes.map((x) => [x.stationFt, x.status])).toEqual([
      [20, 'fail'],
      [40, 'pass'],
    ]);
    expect(changes[0].measured).toBeCloseTo(14, 9);
  });
});
