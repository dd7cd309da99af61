import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { crossSectionAreas, EngineInputError, earthworkFromProfiles } from '@shared/engine';

/** Shoelace area of a polygon: an oracle independent of the engine's piecewise integration. */
const shoelace = (pts: [number, number][]) =>
  Math.abs(
    pts.reduce((s, [x, y], i) => {
      const [x2, y2] = pts[(i + 1) % pts.length];
      return s + x * y2 - x2 * y;
    }, 0),
  ) / 2;

describe('cross-section areas from top width and side slopes (trapezoid geometry)', () => {
  it('level ground in cut: b d + s d^2', () => {
    const r = crossSectionAreas(2, { topWidthFt: 12, cutSlopeHPerV: 2, fillSlopeHPerV: 3, groundCrossSlopePercent: 0 });
    expect(r.cutSqFt).toBeCloseTo(12 * 2 + 2 * 4, 9);
    expect(r.fillSqFt).toBe(0);
  });

  it('level ground in fill: b h + s h^2 with the fill slope', () => {
    const r = crossSectionAreas(-1.5, {
      topWidthFt: 12,
      cutSlopeHPerV: 2,
      fillSlopeHPerV: 3,
      groundCrossSlopePercent: 0,
    });
    expect(r.fillSqFt).toBeCloseTo(12 * 1.5 + 3 * 1.5 ** 2, 9);
    expect(r.cutSqFt).toBe(0);
  });

  it('sloping ground in cut matches the shoelace area of the same polygon', () => {
    const t = { topWidthFt: 12, cutSlopeHPerV: 2, fillSlopeHPerV: 2, groundCrossSlopePercent: 10 };
    const r = crossSectionAreas(2, t);
    const g = 0.1;
    const xr = r.rightCatchFt;
    const xl = -r.leftCatchFt;
    const polygon: [number, number][] = [
      [-6, 0],
      [6, 0],
      [xr, 2 + g * xr],
      [xl, 2 + g * xl],
    ];
    expect(r.cutSqFt).toBeCloseTo(shoelace(polygon), 9);
    expect(2 + g * xr).toBeCloseTo((xr - 6) / 2, 9);
  });

  it('a mixed section (cut on the high side, fill on the low side) has both areas', () => {
    const r = crossSectionAreas(0, {
      topWidthFt: 12,
      cutSlopeHPerV: 2,
      fillSlopeHPerV: 2,
      groundCrossSlopePercent: 20,
    });
    expect(r.cutSqFt).toBeGreaterThan(0);
    expect(r.fillSqFt).toBeCloseTo(r.cutSqFt, 9);
  });

  it('ground steeper than the side slope is refused with the typed error', () => {
    expect(() =>
      crossSectionAreas(1, { topWidthFt: 12, cutSlopeHPerV: 2, fillSlopeHPerV: 2, groundCrossSlopePercent: 60 }),
    ).toThrow(EngineInputError);
  });
});

// Volumes by the average end area and prismoidal formulas (docs/sources.md, "Earthwork").
describe('earthwork from existing and design profiles', () => {
  const template = { topWidthFt: 10, cutSlopeHPerV: 2, fillSlopeHPerV: 2 };

  it('splits the segment where cut turns to fill, so neither volume is averaged across the change', () => {
    const r = earthworkFromProfiles({
      existing: [
        { stationFt: 0, elevationFt: 101 },
        { stationFt: 40, elevationFt: 99 },
      ],
      design: [
        { stationFt: 0, elevationFt: 100 },
        { stationFt: 40, elevationFt: 100 },
      ],
      template,
    });
    expect(r.sections.map((s) => s.stationFt)).toEqual([0, 20, 40]);
    const end = 10 * 1 + 2 * 1;
    expect(r.cutCuYd).toBeCloseTo((20 * end) / 2 / 27, 9);
    expect(r.fillCuYd).toBeCloseTo((20 * end) / 2 / 27, 9);
  });

  it('prismoidal over a uniform cut depth equals the average end area (both exact for a prism)', () => {
    const input = {
      existing: [
        { stationFt: 0, elevationFt: 102 },
        { stationFt: 50, elevationFt: 107 },
      ],
      design: [
        { stationFt: 0, elevationFt: 100 },
        { stationFt: 50, elevationFt: 105 },
      ],
      template,
    };
    const a = earthworkFromProfiles(input);
    const p = earthworkFromProfiles({ ...input, method: 'prismoidal' });
    expect(p.cutCuYd).toBeCloseTo(a.cutCuYd, 9);
    expect(a.cutCuYd).toBeCloseTo((50 * (10 * 2 + 2 * 4)) / 27, 9);
  });

  it('cut and fill are never negative and the per-segment volumes sum to the totals (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -3, max: 3, noNaN: true }), { minLength: 2, maxLength: 20 }), (offsets) => {
        const existing = offsets.map((o, i) => ({ stationFt: i * 10, elevationFt: 100 + i * 0.5 + o }));
        const design = offsets.map((_, i) => ({ stationFt: i * 10, elevationFt: 100 + i * 0.5 }));
        const r = earthworkFromProfiles({ existing, design, template });
        expect(r.cutCuYd).toBeGreaterThanOrEqual(0);
        expect(r.fillCuYd).toBeGreaterThanOrEqual(0);
        expect(r.bySegment.reduce((s, x) => s + x.cutCuYd, 0)).toBeCloseTo(r.cutCuYd, 6);
        expect(r.bySegment.reduce((s, x) => s + x.fillCuYd, 0)).toBeCloseTo(r.fillCuYd, 6);
      }),
    );
  });
});
