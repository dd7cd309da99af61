import { describe, expect, it } from 'vitest';
import { designVertices, MIN_VERTEX_SPACING_FT } from '@shared/engine/design-vertices';
import { proposeProfile } from '@shared/engine';
import { ruleProfile } from './fixtures';

const shots = (count: number, spacingFt: number) =>
  Array.from({ length: count }, (_, i) => ({ stationFt: i * spacingFt, elevationFt: 100 }));
const stationsOf = (points: { stationFt: number }[], idx: number[]) => idx.map((i) => points[i].stationFt);

// The minimum spacing between grade breaks is common practice (no source); see design-vertices.ts.
describe('where a design may break', () => {
  it('keeps every station of a survey shot further apart than the minimum spacing', () => {
    const points = shots(6, 10);
    expect(designVertices(points, new Set())).toEqual([0, 1, 2, 3, 4, 5]);
  });

  it('thins a dense survey to the minimum spacing, keeping the ends and the stations it is told to keep', () => {
    const points = shots(41, 1);
    const s = stationsOf(points, designVertices(points, new Set([12])));
    expect(s).toEqual([0, 5, 10, 12, 17, 22, 27, 32, 37, 40]);
  });

  it('allows closer breaks only over a stretch given for a vertical curve', () => {
    const points = shots(41, 1);
    const s = stationsOf(points, designVertices(points, new Set(), [{ fromFt: 20, toFt: 24, stepFt: 2 }]));
    expect(s).toEqual([0, 5, 10, 15, 20, 22, 24, 29, 34, 39, 40]);
  });

  it('proposes a design on a dense survey that breaks no closer than the minimum spacing', async () => {
    // A vehicle with 36 in of clearance never needs a vertical curve, so no stretch allows closer breaks.
    const base = ruleProfile({ minDrainageGradePercent: 1 });
    const rules = ruleProfile({
      minDrainageGradePercent: 1,
      designVehicle: { ...base.designVehicle, clearanceIn: 36 },
    });
    const existing = Array.from({ length: 120 }, (_, i) => ({
      stationFt: i,
      elevationFt: 100 + 1.5 * Math.sin(i / 9) + 0.4 * Math.sin(i / 2.3),
    }));
    const r = await proposeProfile({ existing, roadEdgeElevationFt: 100 }, rules);
    expect(r.feasible).toBe(true);
    const breaks: number[] = [];
    for (let i = 1; i < r.profile.length - 1; i++) {
      const [a, b, c] = [r.profile[i - 1], r.profile[i], r.profile[i + 1]];
      const change =
        (c.elevationFt - b.elevationFt) / (c.stationFt - b.stationFt) -
        (b.elevationFt - a.elevationFt) / (b.stationFt - a.stationFt);
      // A break is a grade change above a thousandth of a percent; straight runs read as zero to rounding.
      if (Math.abs(change) > 1e-5) breaks.push(b.stationFt);
    }
    expect(breaks.length).toBeGreaterThan(0);
    for (let k = 1; k < breaks.length; k++)
      expect(breaks[k] - breaks[k - 1]).toBeGreaterThanOrEqual(MIN_VERTEX_SPACING_FT - 0.01);
  });
});
