import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  bankToCompacted,
  bankToLoose,
  compactedToBank,
  EngineInputError,
  earthworkVolume,
  soilFactors,
  truckLoads,
} from '@shared/engine';

// Section areas and lengths below are arbitrary inputs; the expectations are the published formulas
// (Wikibooks, Fundamentals of Transportation / Earthwork) worked by hand.
describe('earthwork volumes (Wikibooks, Fundamentals of Transportation / Earthwork)', () => {
  it('average end area: V = L (A1 + A2) / 2, divided by 27 for cubic yards', () => {
    const r = earthworkVolume({
      sections: [
        { stationFt: 0, cutSqFt: 54, fillSqFt: 0 },
        { stationFt: 100, cutSqFt: 108, fillSqFt: 0 },
      ],
    });
    expect(r.cutCuYd).toBeCloseTo((100 * (54 + 108)) / 2 / 27, 9);
    expect(r.fillCuYd).toBe(0);
  });

  it('prismoidal: V = L (A1 + 4 Am + A2) / 6', () => {
    const r = earthworkVolume({
      method: 'prismoidal',
      sections: [
        { stationFt: 0, cutSqFt: 54, fillSqFt: 0, midCutSqFt: 81 },
        { stationFt: 100, cutSqFt: 108, fillSqFt: 0 },
      ],
    });
    expect(r.cutCuYd).toBeCloseTo((100 * (54 + 4 * 81 + 108)) / 6 / 27, 9);
  });

  it('pyramid where one end is zero: V = L A / 3', () => {
    const r = earthworkVolume({
      endMethod: 'pyramid',
      sections: [
        { stationFt: 0, cutSqFt: 0, fillSqFt: 81 },
        { stationFt: 50, cutSqFt: 27, fillSqFt: 0 },
      ],
    });
    expect(r.cutCuYd).toBeCloseTo((50 * 27) / 3 / 27, 9);
    expect(r.fillCuYd).toBeCloseTo((50 * 81) / 3 / 27, 9);
  });

  it('prismoidal without a mid-section is refused, naming the section', () => {
    const run = () =>
      earthworkVolume({
        method: 'prismoidal',
        sections: [
          { stationFt: 0, cutSqFt: 5, fillSqFt: 0 },
          { stationFt: 10, cutSqFt: 5, fillSqFt: 0 },
        ],
      });
    expect(run).toThrow(EngineInputError);
    expect(run).toThrow(/sections\.0\.midCutSqFt/);
  });

  it('sections out of station order are refused', () => {
    expect(() =>
      earthworkVolume({
        sections: [
          { stationFt: 10, cutSqFt: 1, fillSqFt: 0 },
          { stationFt: 0, cutSqFt: 1, fillSqFt: 0 },
        ],
      }),
    ).toThrow(EngineInputError);
  });

  it('volumes are non-negative and add up over segments (property)', () => {
    const section = fc.record({
      cutSqFt: fc.double({ min: 0, max: 500, noNaN: true }),
      fillSqFt: fc.double({ min: 0, max: 500, noNaN: true }),
    });
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.double({ min: 0.5, max: 50, noNaN: true }), section), { minLength: 3, maxLength: 30 }),
        fc.constantFrom('average', 'pyramid' as const),
        (rows, endMethod) => {
          let station = 0;
          const sections = rows.map(([gap, s]) => ({ stationFt: (station += gap), ...s }));
          const whole = earthworkVolume({ sections, endMethod });
          const cut = Math.floor(sections.length / 2);
          const left = earthworkVolume({ sections: sections.slice(0, cut + 1), endMethod });
          const right = earthworkVolume({ sections: sections.slice(cut), endMethod });
          expect(whole.cutCuYd).toBeGreaterThanOrEqual(0);
          expect(whole.fillCuYd).toBeGreaterThanOrEqual(0);
          for (const s of whole.bySegment) expect(Math.min(s.cutCuYd, s.fillCuYd)).toBeGreaterThanOrEqual(0);
          const sum = whole.bySegment.reduce((a, s) => a + s.cutCuYd, 0);
          expect(whole.cutCuYd).toBeCloseTo(sum, 6);
          expect(whole.cutCuYd).toBeCloseTo(left.cutCuYd + right.cutCuYd, 6);
          expect(whole.fillCuYd).toBeCloseTo(left.fillCuYd + right.fillCuYd, 6);
        },
      ),
    );
  });
});

describe('swell, shrink and truck loads (Estimating in Building Construction, ch. 9)', () => {
  it('1,000 bank cy of clay at 30% swell = 1,300 loose cy = 186 loads of 7 cy (example 9-2)', () => {
    const { looseCuYd } = bankToLoose({ bankCuYd: 1000, swellPercent: 30 });
    expect(looseCuYd).toBeCloseTo(1300, 9);
    expect(truckLoads({ looseCuYd, truckCuYd: 7 }).loads).toBe(186);
  });

  it('500 compacted cy at a shrinkage factor of 0.95 = 526 bank cy (example 9-3)', () => {
    expect(Math.round(compactedToBank({ compactedCuYd: 500, shrinkageFactor: 0.95 }).bankCuYd)).toBe(526);
    expect(bankToCompacted({ bankCuYd: 500 / 0.95, shrinkageFactor: 0.95 }).compactedCuYd).toBeCloseTo(500, 9);
  });

  it('an exact number of loads needs no extra trip', () => {
    expect(truckLoads({ looseCuYd: 70, truckCuYd: 7 }).loads).toBe(10);
    expect(truckLoads({ looseCuYd: 0.1 + 0.2, truckCuYd: 0.3 }).loads).toBe(1);
  });

  it('soil factors: loam 1.25/0.90, clay 1.43/0.90, sand 1.11/0.95 (from memory, after FM 5-434 Table 1-1)', () => {
    expect(soilFactors.loam).toEqual({ bankToLoose: 1.25, bankToCompacted: 0.9 });
    expect(soilFactors.clay).toEqual({ bankToLoose: 1.43, bankToCompacted: 0.9 });
    expect(soilFactors.sand).toEqual({ bankToLoose: 1.11, bankToCompacted: 0.95 });
  });
});
