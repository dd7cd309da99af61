import { describe, expect, it } from 'vitest';
import { checkEntrance, commonRuralTemplate } from '@shared/engine';
import { findingOf, profileFromRuns, ruleProfile } from './fixtures';

// A profile that falls and then rises holds water at its low point: geometry. The 1% drainage minimum is a test
// value (common practice (no source)); landing and grades as the common rural template (common practice (no source)).
const highCar = { name: 'High car', wheelbaseFt: 11, frontOverhangFt: 0, rearOverhangFt: 0, clearanceIn: 30 };
const drained = ruleProfile({ minDrainageGradePercent: 1 });
const lowPoint = (profile: { stationFt: number; elevationFt: number }[], rules = drained, roadEdgeStationFt?: number) =>
  findingOf(checkEntrance({ profile, roadEdgeStationFt, vehicle: highCar }, rules).findings, 'drainage.low-point');

describe('a low point that holds water is a finding, with its station', () => {
  it('a driveway that falls 2% for 20 ft and rises 8% beyond passes the drainage minimum but ponds at 0+20', () => {
    const profile = profileFromRuns([
      [20, -2],
      [40, 8],
    ]);
    const all = checkEntrance({ profile, vehicle: highCar }, drained).findings;
    expect(findingOf(all, 'grade.min-drainage').status).toBe('pass');
    const f = lowPoint(profile);
    expect(f).toMatchObject({ status: 'fail', stationFt: 20, unit: 'in', label: 'Low point that holds water' });
    // Water stands to the lower rim, the road edge 0.4 ft above the low point: 4.8 in.
    expect(f.measured).toBeCloseTo(4.8, 9);
    expect(checkEntrance({ profile, vehicle: highCar }, drained).summary.text).toContain(
      'water would stand at station 0+20 (4.8 in deep)',
    );
  });

  it('water running toward the road ponds against it when the road edge is the low point', () => {
    // A shot on the road 10 ft out stands 0.2 ft above the road edge; the driveway rises 3% away from the road.
    const profile = [
      { stationFt: -10, elevationFt: 100.2 },
      ...profileFromRuns([
        [20, 3],
        [40, 8],
      ]),
    ];
    const f = lowPoint(profile, drained, 0);
    expect(f).toMatchObject({ status: 'fail', stationFt: 0 });
    expect(f.measured).toBeCloseTo(2.4, 9);
  });

  it('the road side drawn from its stated slopes is driven over but holds no water: the road drains along its edge', () => {
    // A road falling 2% to its edge and a driveway rising 3% from it: the usual entrance, not a pond (common practice
    // (no source): water on the road's cross slope runs along the edge to the ditch the culvert carries).
    const crowned = checkEntrance(
      {
        profile: profileFromRuns([
          [20, 3],
          [40, 8],
        ]),
        roadEdgeStationFt: 0,
        vehicle: highCar,
        roadSide: { roadCrossSlopePercent: 2 },
      },
      drained,
    );
    expect(findingOf(crowned.findings, 'drainage.low-point').status).toBe('pass');
    expect(findingOf(crowned.findings, 'grade.road-edge-change').measured).toBeCloseTo(5, 9);
  });

  it('a profile that drains all the way, or whose low point is on the road itself, passes', () => {
    expect(
      lowPoint(
        profileFromRuns([
          [20, 2],
          [40, 8],
        ]),
      ).status,
    ).toBe('pass');
    const roadDip = [
      { stationFt: -20, elevationFt: 100 },
      { stationFt: -10, elevationFt: 99.8 },
      ...profileFromRuns([
        [20, 2],
        [40, 8],
      ]),
    ];
    expect(lowPoint(roadDip, drained, 0).status).toBe('pass');
  });

  it('a dip shallower than the survey reads (0.01 ft) is noise, not a pond', () => {
    const profile = [
      ...profileFromRuns([
        [20, 2],
        [10, 0],
      ]),
      { stationFt: 35, elevationFt: 100.395 },
      { stationFt: 70, elevationFt: 103 },
    ];
    expect(lowPoint(profile).status).toBe('pass');
  });

  it('without a drainage minimum in the rule profile a pond is still said, as an item to look at', () => {
    const f = lowPoint(
      profileFromRuns([
        [20, -2],
        [40, 8],
      ]),
      commonRuralTemplate,
    );
    expect(f).toMatchObject({ status: 'advisory', stationFt: 20 });
    expect(f.note).toMatch(/holds water/);
  });
});
