import { describe, expect, it } from 'vitest';
import { checkEntrance, EngineInputError } from '../../shared/engine';
import { findingOf, profileFromRuns, ruleProfile } from './fixtures';

// The warp turns the apron's cross slope linearly with distance from the road's grade (at the road edge) to the
// driveway's cross slope, rotating the edges about the centreline the way superelevation runoff is developed at a
// constant relative gradient (AASHTO Green Book ch. 3, from memory). Every figure below is exact geometry:
// edge elevation = centreline + cross slope x offset. Limits are the common rural template's (common practice (no source)).
const apron = { roadGradePercent: 3, drivewayCrossSlopePercent: 0, entranceWidthFt: 12, warpLengthFt: 20 };

describe('the apron in three dimensions', () => {
  it('each edge carries the warp: with the road rising 3% to the right over a 12 ft entrance, the right edge starts 0.18 ft up', () => {
    const r = checkEntrance({ profile: profileFromRuns([[20, 0], [30, 6]]), roadEdgeStationFt: 0, apron }, ruleProfile());
    const { left, right } = r.apron!.edges;
    expect(right[0]).toEqual({ stationFt: 0, elevationFt: expect.closeTo(100.18, 9) });
    expect(left[0]).toEqual({ stationFt: 0, elevationFt: expect.closeTo(99.82, 9) });
    // Over the 20 ft warp the right edge falls 0.18 ft (-0.9%) and the left edge rises 0.9% against a level centreline.
    const at20 = (pts: { stationFt: number; elevationFt: number }[]) => pts.find((p) => p.stationFt === 20)!.elevationFt;
    expect(at20(right)).toBeCloseTo(100, 9);
    expect(at20(left)).toBeCloseTo(100, 9);
  });

  it('fails the landing on the edge the centreline does not show: centreline 4%, left edge 4.9%', () => {
    const r = checkEntrance({ profile: profileFromRuns([[20, 4], [30, 6]]), roadEdgeStationFt: 0, apron }, ruleProfile());
    expect(findingOf(r.findings, 'landing.max-grade').status).toBe('pass');
    const left = findingOf(r.findings, 'apron.left.landing.max-grade');
    expect(left.measured).toBeCloseTo(4.9, 9);
    expect(left.status).toBe('fail');
    expect(left.label).toBe('Left edge of the entrance: landing grade (rising)');
    expect(findingOf(r.findings, 'apron.right.landing.max-grade').measured).toBeCloseTo(3.1, 9);
    expect(r.passes).toBe(false);
  });

  it('checks the grade change on each edge, including where the warp ends', () => {
    // Centreline 2% straight through: the only edge breaks are the warp's own, 0.9% at its end.
    const r = checkEntrance({ profile: profileFromRuns([[50, 2]]), roadEdgeStationFt: 0, apron }, ruleProfile());
    expect(findingOf(r.findings, 'grade.max-change').status).toBe('not-checked');
    const f = findingOf(r.findings, 'apron.right.grade.max-change');
    expect(f.measured).toBeCloseTo(0.9, 9);
    expect(f.stationFt).toBe(20);
  });

  it('with a road side given, each edge also gets its road-edge break', () => {
    const r = checkEntrance({ profile: profileFromRuns([[20, 4], [30, 6]]), roadEdgeStationFt: 0, apron, roadSide: { roadCrossSlopePercent: 2 } }, ruleProfile());
    // Left edge starts at 4.9%, after a road falling 2% to the edge: 6.9%.
    expect(findingOf(r.findings, 'apron.left.grade.road-edge-change').measured).toBeCloseTo(6.9, 9);
  });

  it('gives the crew a warp stake table: station, offsets left and right, design elevations', () => {
    const r = checkEntrance({ profile: profileFromRuns([[20, 4], [30, 6]]), roadEdgeStationFt: 0, apron }, ruleProfile());
    const stakes = r.apron!.stakes;
    expect(stakes.map((s) => s.stationFt)).toEqual([0, 5, 10, 15, 20]);
    expect(stakes.map((s) => s.crossSlopePercent)).toEqual([3, 2.25, 1.5, 0.75, 0].map((v) => expect.closeTo(v, 9)));
    const at10 = stakes[2];
    expect(at10.leftOffsetFt).toBe(-6);
    expect(at10.rightOffsetFt).toBe(6);
    expect(at10.centreElevationFt).toBeCloseTo(100.4, 9);
    expect(at10.rightElevationFt).toBeCloseTo(100.4 + 0.015 * 6, 9);
    expect(at10.leftElevationFt).toBeCloseTo(100.4 - 0.015 * 6, 9);
  });

  it('takes the warp length from the input, else the rule profile, else the landing length, and says which', () => {
    const { warpLengthFt: _w, ...noLength } = apron;
    const own = checkEntrance({ profile: profileFromRuns([[20, 0], [30, 6]]), apron: noLength }, ruleProfile());
    expect(own.apron).toMatchObject({ warpLengthFt: 20, warpLengthFrom: 'landing length' });
    const ruled = checkEntrance({ profile: profileFromRuns([[20, 0], [30, 6]]), apron: noLength }, ruleProfile({ geometry: { warpLengthFt: 10 } }));
    expect(ruled.apron).toMatchObject({ warpLengthFt: 10, warpLengthFrom: 'rule profile' });
    expect(ruled.apron!.stakes.map((s) => s.stationFt)).toEqual([0, 5, 10]);
  });

  it('an older check without the apron still runs and says the edges were not checked', () => {
    const r = checkEntrance({ profile: profileFromRuns([[20, 0], [30, 6]]) }, ruleProfile());
    expect(findingOf(r.findings, 'apron.edges')).toMatchObject({ status: 'not-checked' });
    expect(r.apron).toBeUndefined();
  });

  it('needs the entrance width, from the apron or the geometry, and names the field when there is none', () => {
    const { entranceWidthFt: _e, ...noWidth } = apron;
    const fromGeometry = checkEntrance({ profile: profileFromRuns([[20, 0], [30, 6]]), apron: noWidth, geometry: { widthFt: 16 } }, ruleProfile());
    expect(fromGeometry.apron!.halfWidthFt).toBe(8);
    expect(() => checkEntrance({ profile: profileFromRuns([[20, 0], [30, 6]]), apron: noWidth }, ruleProfile())).toThrow(EngineInputError);
    try {
      checkEntrance({ profile: profileFromRuns([[20, 0], [30, 6]]), apron: noWidth }, ruleProfile());
    } catch (e) {
      expect((e as EngineInputError).field).toBe('apron.entranceWidthFt');
    }
  });
});
