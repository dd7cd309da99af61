import { describe, expect, it } from 'vitest';
import { checkEntrance, EngineInputError, laserSetup } from '@shared/engine';
import { findingOf, profileFromRuns, ruleProfile } from './fixtures';

// The landing is one plane carrying the road's grade across (the first laser setup); from the landing's end the warp
// turns the apron's cross slope linearly with distance from the road's grade to the driveway's cross slope, rotating the edges about the centreline the way superelevation runoff is developed at a
// constant relative gradient (AASHTO Green Book ch. 3, from memory). Every figure below is exact geometry:
// edge elevation = centreline + cross slope x offset. Limits are the common rural template's (common practice (no source)).
const apron = { roadGradePercent: 3, drivewayCrossSlopePercent: 0, entranceWidthFt: 12, warpLengthFt: 20 };

describe('the apron in three dimensions', () => {
  it('each edge carries the warp: with the road rising 3% to the right over a 12 ft entrance, the right edge starts 0.18 ft up', () => {
    const r = checkEntrance(
      {
        profile: profileFromRuns([
          [20, 0],
          [30, 6],
        ]),
        roadEdgeStationFt: 0,
        apron,
      },
      ruleProfile(),
    );
    const { left, right } = r.apron!.edges;
    expect(right[0]).toEqual({ stationFt: 0, elevationFt: expect.closeTo(100.18, 9) });
    expect(left[0]).toEqual({ stationFt: 0, elevationFt: expect.closeTo(99.82, 9) });
    // Through the 20 ft landing the edges stay 0.18 ft either side of the level centreline; over the 20 ft warp after
    // it the right edge falls 0.18 ft (-0.9%) and the left rises 0.9% against the centreline's 6%.
    const at = (pts: { stationFt: number; elevationFt: number }[], st: number) =>
      pts.find((p) => p.stationFt === st)!.elevationFt;
    expect(at(right, 20)).toBeCloseTo(100.18, 9);
    expect(at(left, 20)).toBeCloseTo(99.82, 9);
    expect(at(right, 40)).toBeCloseTo(101.2, 9);
    expect(at(left, 40)).toBeCloseTo(101.2, 9);
  });

  it('fails the driveway grade on the edge the centreline does not show: centreline 16.5%, left edge 17.4% in the warp', () => {
    const r = checkEntrance(
      {
        profile: profileFromRuns([
          [20, 4],
          [30, 16.5],
        ]),
        roadEdgeStationFt: 0,
        apron,
      },
      ruleProfile(),
    );
    expect(findingOf(r.findings, 'grade.max').status).toBe('pass');
    const left = findingOf(r.findings, 'apron.left.grade.max');
    expect(left.measured).toBeCloseTo(17.4, 9);
    expect(left.status).toBe('fail');
    expect(left.label).toBe('Left edge of the entrance: driveway grade beyond the landing');
    expect(findingOf(r.findings, 'apron.right.grade.max').measured).toBeCloseTo(16.5, 9);
    // The landing is one plane: both edges carry the centreline's 4%.
    expect(findingOf(r.findings, 'apron.left.landing.max-grade').measured).toBeCloseTo(4, 9);
    expect(r.passes).toBe(false);
  });

  it('checks the grade change on each edge, where the warp begins and ends', () => {
    // Centreline 2% straight through: the only edge breaks are the warp's own, 0.9% where it begins and ends.
    const r = checkEntrance({ profile: profileFromRuns([[50, 2]]), roadEdgeStationFt: 0, apron }, ruleProfile());
    expect(findingOf(r.findings, 'grade.max-change').status).toBe('not-checked');
    const f = findingOf(r.findings, 'apron.right.grade.max-change');
    expect(f.measured).toBeCloseTo(0.9, 9);
    expect(f.stationFt).toBe(20);
  });

  it('with a road side given, each edge also gets its road-edge break', () => {
    const r = checkEntrance(
      {
        profile: profileFromRuns([
          [20, 4],
          [30, 6],
        ]),
        roadEdgeStationFt: 0,
        apron,
        roadSide: { roadCrossSlopePercent: 2 },
      },
      ruleProfile(),
    );
    // The left edge starts at the landing's 4%, after a road falling 2% to the edge: 6%.
    expect(findingOf(r.findings, 'apron.left.grade.road-edge-change').measured).toBeCloseTo(6, 9);
  });

  it('gives the crew a warp stake table: station, offsets left and right, design elevations', () => {
    const r = checkEntrance(
      {
        profile: profileFromRuns([
          [20, 4],
          [30, 6],
        ]),
        roadEdgeStationFt: 0,
        apron,
      },
      ruleProfile(),
    );
    const stakes = r.apron!.stakes;
    expect(stakes.map((s) => s.stationFt)).toEqual([0, 5, 10, 15, 20, 25, 30, 35, 40]);
    expect(stakes.map((s) => s.crossSlopePercent)).toEqual(
      [3, 3, 3, 3, 3, 2.25, 1.5, 0.75, 0].map((v) => expect.closeTo(v, 9)),
    );
    expect(r.apron!.warpStartStationFt).toBe(20);
    const at30 = stakes[6];
    expect(at30.leftOffsetFt).toBe(-6);
    expect(at30.rightOffsetFt).toBe(6);
    expect(at30.centreElevationFt).toBeCloseTo(100.8 + 0.6, 9);
    expect(at30.rightElevationFt).toBeCloseTo(101.4 + 0.015 * 6, 9);
    expect(at30.leftElevationFt).toBeCloseTo(101.4 - 0.015 * 6, 9);
  });

  it('takes the warp length from the input, else the rule profile, else the landing length, and says which', () => {
    const { warpLengthFt: _w, ...noLength } = apron;
    const own = checkEntrance(
      {
        profile: profileFromRuns([
          [20, 0],
          [30, 6],
        ]),
        apron: noLength,
      },
      ruleProfile(),
    );
    expect(own.apron).toMatchObject({ warpLengthFt: 20, warpLengthFrom: 'landing length' });
    const ruled = checkEntrance(
      {
        profile: profileFromRuns([
          [20, 0],
          [30, 6],
        ]),
        apron: noLength,
      },
      ruleProfile({ geometry: { warpLengthFt: 10 } }),
    );
    expect(ruled.apron).toMatchObject({ warpLengthFt: 10, warpLengthFrom: 'rule profile' });
    expect(ruled.apron!.stakes.map((s) => s.stationFt)).toEqual([0, 5, 10, 15, 20, 25, 30]);
  });

  it('an older check without the apron still runs and says the edges were not checked', () => {
    const r = checkEntrance(
      {
        profile: profileFromRuns([
          [20, 0],
          [30, 6],
        ]),
      },
      ruleProfile(),
    );
    expect(findingOf(r.findings, 'apron.edges')).toMatchObject({ status: 'not-checked' });
    expect(r.apron).toBeUndefined();
  });

  it('needs the entrance width, from the apron or the geometry, and names the field when there is none', () => {
    const { entranceWidthFt: _e, ...noWidth } = apron;
    const fromGeometry = checkEntrance(
      {
        profile: profileFromRuns([
          [20, 0],
          [30, 6],
        ]),
        apron: noWidth,
        geometry: { widthFt: 16 },
      },
      ruleProfile(),
    );
    expect(fromGeometry.apron!.halfWidthFt).toBe(8);
    expect(() =>
      checkEntrance(
        {
          profile: profileFromRuns([
            [20, 0],
            [30, 6],
          ]),
          apron: noWidth,
        },
        ruleProfile(),
      ),
    ).toThrow(EngineInputError);
    try {
      checkEntrance(
        {
          profile: profileFromRuns([
            [20, 0],
            [30, 6],
          ]),
          apron: noWidth,
        },
        ruleProfile(),
      );
    } catch (e) {
      expect((e as EngineInputError).field).toBe('apron.entranceWidthFt');
    }
  });

  it('is the warp the driveway laser setup uses: warp stakes and the laser agree on both edges', () => {
    const r = checkEntrance(
      {
        profile: profileFromRuns([
          [20, 4],
          [30, 6],
        ]),
        roadEdgeStationFt: 0,
        apron,
      },
      ruleProfile(),
    );
    const stakes = r.apron!.stakes;
    const laser = laserSetup({
      originElevationFt: 100,
      roadGradePercent: 3,
      landingGradePercent: 4,
      landingLengthFt: 20,
      drivewayGradePercent: 6,
      drivewayCrossSlopePercent: 0,
      warpLengthFt: 20,
      receiverOffsetFt: 5,
      stakes: stakes.flatMap((s) => [
        { label: `L${s.stationFt}`, offsetFt: s.leftOffsetFt, distanceFt: s.stationFt, rodReadingFt: 5 },
        { label: `R${s.stationFt}`, offsetFt: s.rightOffsetFt, distanceFt: s.stationFt, rodReadingFt: 5 },
      ]),
    });
    stakes.forEach((s, i) => {
      expect(laser.stakes[2 * i].designElevationFt).toBeCloseTo(s.leftElevationFt, 9);
      expect(laser.stakes[2 * i + 1].designElevationFt).toBeCloseTo(s.rightElevationFt, 9);
    });
  });
});
