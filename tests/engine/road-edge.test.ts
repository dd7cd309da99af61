import { describe, expect, it } from 'vitest';
import { checkEntrance, EngineInputError } from '@shared/engine';
import { findingOf, profileFromRuns, ruleProfile } from './fixtures';

// Grade change = algebraic difference of the two grades (exact geometry). The 13% limit is the common rural
// template's (17 - 4, common practice (no source)); the passenger car is the template's design vehicle
// (Green Book P vehicle, US figures from memory; 5 in clearance after Eck and Kang, TRR 1356).
const landingAt = (gradePercent: number) =>
  profileFromRuns([
    [20, gradePercent],
    [30, gradePercent],
  ]);

describe('the break at the road edge', () => {
  it('a 2% crown falling to the edge and a landing rising 4% make a 6% sag at the road edge', () => {
    const r = checkEntrance(
      { profile: landingAt(4), roadEdgeStationFt: 0, roadSide: { roadCrossSlopePercent: 2 } },
      ruleProfile(),
    );
    const f = findingOf(r.findings, 'grade.road-edge-change');
    expect(f.measured).toBeCloseTo(6, 9);
    expect(f.limit).toBe(13);
    expect(f.status).toBe('pass');
    expect(f.stationFt).toBe(0);
  });

  it('fails a break over the grade-change limit that no other check sees: road 3% down to the edge, landing 11% up', () => {
    const rules = ruleProfile({ landing: { lengthFt: 20, minGradePercent: -12, maxGradePercent: 12 } });
    const without = checkEntrance({ profile: landingAt(11), roadEdgeStationFt: 0 }, rules);
    expect(without.findings.filter((f) => f.status === 'fail')).toEqual([]);
    const r = checkEntrance(
      { profile: landingAt(11), roadEdgeStationFt: 0, roadSide: { roadCrossSlopePercent: 3 } },
      rules,
    );
    const f = findingOf(r.findings, 'grade.road-edge-change');
    expect(f.measured).toBeCloseTo(14, 9);
    expect(f.status).toBe('fail');
    expect(r.passes).toBe(false);
  });

  it('with a shoulder, the break is between the shoulder and the landing, and a road banked away from the edge counts its sign', () => {
    const r = checkEntrance(
      {
        profile: landingAt(-2),
        roadEdgeStationFt: 0,
        roadSide: { roadCrossSlopePercent: 2, shoulderWidthFt: 4, shoulderSlopePercent: 6 },
      },
      ruleProfile(),
    );
    // Shoulder falling 6% toward the edge is a -6% grade into the property; the landing falls 2%: change 4%.
    expect(findingOf(r.findings, 'grade.road-edge-change').measured).toBeCloseTo(4, 9);
    const banked = checkEntrance(
      { profile: landingAt(4), roadEdgeStationFt: 0, roadSide: { roadCrossSlopePercent: -2 } },
      ruleProfile(),
    );
    expect(findingOf(banked.findings, 'grade.road-edge-change').measured).toBeCloseTo(2, 9);
  });

  it('the scrape check drives over the road and the break: a sag of 12% at the edge bottoms out the rear overhang', () => {
    // 5 ft rear overhang x 0.12 = 7.2 in > 5 in clearance (sag loss about Lo A, REFERENCES "Vertical transitions").
    const rules = ruleProfile({ landing: { lengthFt: 20, minGradePercent: -12, maxGradePercent: 12 } });
    const flat = checkEntrance({ profile: landingAt(8), roadEdgeStationFt: 0 }, rules);
    expect(flat.scrape.passes).toBe(true);
    const r = checkEntrance(
      { profile: landingAt(8), roadEdgeStationFt: 0, roadSide: { roadCrossSlopePercent: 4 } },
      rules,
    );
    expect(r.scrape.passes).toBe(false);
    expect(r.scrape.where).toBe('rear-overhang');
    expect(findingOf(r.findings, 'scrape.clearance').status).toBe('fail');
    // The report's profile stays the surveyed one; only the scrape sees the road side.
    expect(r.profile.points[0].stationFt).toBe(0);
  });

  it('an older check with no road side still runs and says why the road-edge break was not checked', () => {
    const r = checkEntrance({ profile: landingAt(4), roadEdgeStationFt: 0 }, ruleProfile());
    expect(findingOf(r.findings, 'grade.road-edge-change')).toMatchObject({
      status: 'not-checked',
      note: 'no road cross slope in the input',
    });
  });

  it('a shoulder width without its slope is refused, naming the field', () => {
    expect(() =>
      checkEntrance(
        { profile: landingAt(4), roadSide: { roadCrossSlopePercent: 2, shoulderWidthFt: 4 } },
        ruleProfile(),
      ),
    ).toThrow(EngineInputError);
    try {
      checkEntrance(
        { profile: landingAt(4), roadSide: { roadCrossSlopePercent: 2, shoulderWidthFt: 4 } },
        ruleProfile(),
      );
    } catch (e) {
      expect((e as EngineInputError).field).toBe('roadSide.shoulderSlopePercent');
    }
  });
});

describe('a road edge a floating-point hair from a shot', () => {
  it('0.1 + 0.2 ft against a shot at 0.3 ft reads the real landing grade, on the centreline and on both edges', () => {
    const profile = [
      { stationFt: 0.3, elevationFt: 100 },
      { stationFt: 20.3, elevationFt: 100.8 },
      { stationFt: 50.3, elevationFt: 102.6 },
    ];
    const apron = { roadGradePercent: 0, entranceWidthFt: 12, warpLengthFt: 20 };
    const r = checkEntrance(
      { profile, roadEdgeStationFt: 0.1 + 0.2, roadSide: { roadCrossSlopePercent: 2 }, apron },
      ruleProfile(),
    );
    expect(findingOf(r.findings, 'grade.road-edge-change').measured).toBeCloseTo(6, 6);
    expect(findingOf(r.findings, 'apron.left.grade.road-edge-change').measured).toBeCloseTo(6, 6);
    expect(findingOf(r.findings, 'apron.left.landing.max-grade').measured).toBeCloseTo(4, 6);
    expect(r.scrape.passes).toBe(true);
  });

  it('and the other way round: a road edge at 0.3 ft against a shot summed to 0.1 + 0.2 ft', () => {
    const profile = [
      { stationFt: 0.1 + 0.2, elevationFt: 100 },
      { stationFt: 20.3, elevationFt: 100.8 },
      { stationFt: 50.3, elevationFt: 102.6 },
    ];
    const apron = { roadGradePercent: 0, entranceWidthFt: 12, warpLengthFt: 20 };
    const r = checkEntrance(
      { profile, roadEdgeStationFt: 0.3, roadSide: { roadCrossSlopePercent: 2 }, apron },
      ruleProfile(),
    );
    expect(findingOf(r.findings, 'grade.road-edge-change').measured).toBeCloseTo(6, 6);
    expect(findingOf(r.findings, 'apron.right.grade.road-edge-change').measured).toBeCloseTo(6, 6);
    expect(findingOf(r.findings, 'apron.right.landing.min-grade').measured).toBeCloseTo(4, 6);
  });
});
