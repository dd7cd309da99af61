import { describe, expect, it } from 'vitest';
import { laserSetup } from '../../shared/engine';

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

  it('steepest slope is sqrt(gx^2 + gy^2) (DESIGN.md, Laser and stakes)', () => {
    expect(laserSetup(base).steepestPercent).toBeCloseTo(5, 12);
  });

  it('steepest rise points clockwise from the driveway heading by atan2(gx, gy)', () => {
    expect(laserSetup({ ...base, roadGradePercent: 2, landingGradePercent: 2 }).steepestBearingDeg).toBeCloseTo(45, 9);
    expect(laserSetup({ ...base, roadGradePercent: 2, landingGradePercent: 2, drivewayBearingDeg: 350 }).steepestBearingDeg).toBeCloseTo(35, 9);
    expect(laserSetup({ ...base, roadGradePercent: -2, landingGradePercent: 0 }).steepestBearingDeg).toBeCloseTo(270, 9);
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
    expect(secondSetup).toMatchObject({ alongRoadPercent: 0, alongDrivewayPercent: 12, originDistanceFt: 20 });
    expect(secondSetup.originElevationFt).toBeCloseTo(99.2, 9);
    expect(secondSetup.description).toContain('12% rising away from the road');
  });
});
