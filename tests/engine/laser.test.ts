import { describe, expect, it } from 'vitest';
import { EngineInputError, laserSetup, laserStepAtChangeFt, type PlaneSetting } from '@shared/engine';

const base = {
  originElevationFt: 100,
  roadGradePercent: 3,
  landingGradePercent: -4,
  landingLengthFt: 20,
  drivewayGradePercent: 12,
  receiverOffsetFt: 5,
};

describe('dual-slope laser setup for the apron', () => {
  it('sets one axis to the road grade and the other to the landing grade, with signs in words', () => {
    const r = laserSetup(base);
    expect(r.alongRoadPercent).toBe(3);
    expect(r.alongDrivewayPercent).toBe(-4);
    expect(r.description).toContain('3% rising to the right');
    expect(r.description).toContain('4% falling away from the road');
  });

  it('steepest slope is sqrt(gx^2 + gy^2) (docs/sources.md, "Plane and profile geometry")', () => {
    expect(laserSetup(base).steepestPercent).toBeCloseTo(5, 12);
  });

  it('steepest rise points clockwise from the driveway heading by atan2(gx, gy)', () => {
    expect(laserSetup({ ...base, roadGradePercent: 2, landingGradePercent: 2 }).steepestBearingDeg).toBeCloseTo(45, 9);
    expect(
      laserSetup({ ...base, roadGradePercent: 2, landingGradePercent: 2, drivewayBearingDeg: 350 }).steepestBearingDeg,
    ).toBeCloseTo(35, 9);
    expect(laserSetup({ ...base, roadGradePercent: -2, landingGradePercent: 0 }).steepestBearingDeg).toBeCloseTo(
      270,
      9,
    );
  });

  it('gives each stake its design elevation and cut or fill from the rod reading and receiver offset', () => {
    const r = laserSetup({
      ...base,
      stakes: [
        { label: 'L1', offsetFt: -6, distanceFt: 10, rodReadingFt: 4.6 },
        { label: 'R1', offsetFt: 6, distanceFt: 10, rodReadingFt: 5.25 },
        { label: 'C3', offsetFt: 0, distanceFt: 40, rodReadingFt: 5 },
      ],
    });
    const [l1, r1, c3] = r.stakes;
    expect(l1.designElevationFt).toBeCloseTo(100 - 0.18 - 0.4, 9);
    expect(l1).toMatchObject({ setup: 'first', cutFillFt: 0.4, instruction: 'cut 0.40 ft' });
    expect(r1).toMatchObject({ cutFillFt: -0.25, instruction: 'fill 0.25 ft' });
    expect(c3).toMatchObject({ setup: 'second', instruction: 'on grade' });
    expect(c3.designElevationFt).toBeCloseTo(100 - 0.8 + 0.12 * 20, 9);
  });

  it('starts the second setup at the landing end with the driveway grade', () => {
    const { secondSetup } = laserSetup(base);
    expect(secondSetup).toMatchObject({ alongRoadPercent: 3, alongDrivewayPercent: 12, originDistanceFt: 20 });
    expect(secondSetup.originElevationFt).toBeCloseTo(99.2, 9);
    expect(secondSetup.description).toContain('12% rising away from the road');
  });
});

// Plane geometry (exact): z = z0 + gx x + gy (y - y0). Values meet within a thousandth of a foot, a tenth of
// the survey's 0.01 ft precision (docs/sources.md, "Survey precision": common practice (no source)).
const at = (plane: PlaneSetting, offsetFt: number, distanceFt: number) =>
  plane.originElevationFt +
  (plane.alongRoadPercent / 100) * offsetFt +
  (plane.alongDrivewayPercent / 100) * (distanceFt - plane.originDistanceFt);

describe('the two setups meet along the change line', () => {
  it('values of both planes along the change line agree at every offset', () => {
    for (const roadGradePercent of [-6, -2, 0, 3, 8]) {
      const r = laserSetup({ ...base, roadGradePercent });
      for (let offsetFt = -15; offsetFt <= 15; offsetFt += 2.5) {
        expect(Math.abs(at(r, offsetFt, 20) - at(r.secondSetup, offsetFt, 20))).toBeLessThan(0.001);
      }
      expect(laserStepAtChangeFt(r, 15)).toBeLessThan(0.001);
    }
  });

  it('stakes either side of the change line at the driveway edge show no step', () => {
    const r = laserSetup({
      ...base,
      stakes: [
        { label: 'L-in', offsetFt: -8, distanceFt: 20, rodReadingFt: 5 },
        { label: 'L-out', offsetFt: -8, distanceFt: 20.01, rodReadingFt: 5 },
      ],
    });
    const [inside, outside] = r.stakes;
    expect([inside.setup, outside.setup]).toEqual(['first', 'second']);
    // 0.01 ft further along at 12% rises 0.0012 ft; anything more is a step.
    expect(Math.abs(outside.designElevationFt - inside.designElevationFt - 0.0012)).toBeLessThan(1e-9);
  });

  it('a driveway cross slope other than the road grade is reached through a warp, with stakes on it', () => {
    const r = laserSetup({
      ...base,
      drivewayCrossSlopePercent: 0,
      warpLengthFt: 10,
      stakes: [
        { label: 'W0', offsetFt: 6, distanceFt: 20, rodReadingFt: 5 },
        { label: 'W5', offsetFt: 6, distanceFt: 25, rodReadingFt: 5 },
        { label: 'W10', offsetFt: 6, distanceFt: 30, rodReadingFt: 5 },
      ],
    });
    expect(r.warp).toMatchObject({
      fromDistanceFt: 20,
      toDistanceFt: 30,
      fromCrossSlopePercent: 3,
      toCrossSlopePercent: 0,
    });
    expect(r.secondSetup).toMatchObject({ alongRoadPercent: 0, originDistanceFt: 30 });
    expect(r.stakes.map((s) => s.setup)).toEqual(['first', 'warp', 'second']);
    // Cross slope halfway through the warp is 1.5%: 99.2 + 0.12 x 5 + 0.015 x 6.
    expect(r.stakes[1].designElevationFt).toBeCloseTo(99.2 + 0.6 + 0.09, 9);
    expect(at(r, 6, 20)).toBeCloseTo(99.2 + 0.18, 9);
    expect(at(r.secondSetup, 6, 30)).toBeCloseTo(99.2 + 1.2, 9);
    expect(laserStepAtChangeFt(r, 15)).toBeLessThan(0.001);
  });

  it('refuses a different driveway cross slope with no warp length, since the planes would step', () => {
    expect(() => laserSetup({ ...base, drivewayCrossSlopePercent: 0 })).toThrow(EngineInputError);
    expect(() => laserSetup({ ...base, drivewayCrossSlopePercent: 0 })).toThrow(/^warpLengthFt: /);
  });
});
