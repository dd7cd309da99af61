import { describe, expect, it } from 'vitest';
import {
  checkEntrance,
  entranceLossCoefficients,
  EngineInputError,
  inletControlHeadwater,
  inletTypes,
  outletControlHeadwater,
} from '@shared/engine';
import { findingOf, profileFromRuns, ruleProfile } from './fixtures';

// FHWA HDS-5, Hydraulic Design of Highway Culverts, 3rd ed. 2012, chapter 3 and Appendix C:
// HL = [1 + ke + 29 n^2 L / R^1.33] V^2 / 2g, HWo = ho + HL - S L, ho = max(TW, (dc + D)/2), dc <= D.
// The hand-worked figures are marked "worked by hand from the HDS-5 equations (no published example found)"; dc by
// bisection on Q^2 T = g A^3 for the circular section. One published worked example (below) checks the same path.
const M = 0.3048;
describe('outlet-control headwater (FHWA HDS-5 3rd ed. 2012, chapter 3, Table C.2)', () => {
  it('the entrance loss coefficients are HDS-5 Table C.2 for each inlet we offer', () => {
    expect(entranceLossCoefficients).toEqual({
      'concrete-square-headwall': 0.5, // concrete with headwall, square edge
      'concrete-groove-headwall': 0.2, // concrete with headwall, socket (groove) end
      'concrete-groove-projecting': 0.2, // concrete projecting from fill, socket (groove) end
      'cmp-headwall': 0.5, // corrugated metal with headwall, square edge
      'cmp-mitered': 0.7, // mitered to conform to the fill slope
      'cmp-projecting': 0.9, // corrugated metal projecting from fill, no headwall
    });
    expect(Object.keys(entranceLossCoefficients).sort()).toEqual([...inletTypes].sort());
  });

  // Published worked example: "Case Study 3: Outlet Control Pipe Culvert, Manual Calculation", culvert documentation
  // at msmaware.com (web page, no edition; its equations 7.5 and 7.6 are HDS-5's full-flow loss and HW = H + ho - S L).
  // Inputs: Q 0.9 m3/s, one 0.6 m concrete pipe, ke 0.5, n 0.012, L 25 m, S 0.0084, TW 1.5 m. Published: V 3.183 m/s,
  // dc 0.571 m, ho = TW = 1.5 m, H 1.232 m, HWo 2.522 m, and outlet control governs over inlet control's 1.723 m.
  // Within 0.005 m: the page works in SI with 2g and R^(4/3), the engine in US units with HDS-5's 29 and R^1.33.
  it('matches a published worked example in SI: 0.6 m concrete pipe, Q 0.9 m3/s, TW 1.5 m: H 1.232 m, HWo 2.522 m', () => {
    const r = outletControlHeadwater({
      inlet: 'concrete-square-headwall',
      diameterFt: 0.6 / M,
      flowCfs: 0.9 / M ** 3,
      manningN: 0.012,
      lengthFt: 25 / M,
      slopeFtPerFt: 0.0084,
      tailwaterDepthFt: 1.5 / M,
    });
    expect(r.entranceLossCoefficient).toBe(0.5);
    expect(Math.abs(r.velocityFtPerS * M - 3.183)).toBeLessThan(0.001);
    expect(Math.abs(r.criticalDepthFt * M - 0.571)).toBeLessThan(0.001);
    expect(r.tailwaterGoverns).toBe(true);
    expect(Math.abs(r.headLossFt * M - 1.232)).toBeLessThan(0.005);
    expect(Math.abs(r.headwaterFt * M - 2.522)).toBeLessThan(0.005);
    const inlet = inletControlHeadwater({
      inlet: 'concrete-square-headwall',
      diameterFt: 0.6 / M,
      flowCfs: 0.9 / M ** 3,
      slopeFtPerFt: 0.0084,
    });
    expect(Math.abs(inlet.headwaterFt * M - 1.723)).toBeLessThan(0.005);
    expect(r.headwaterFt).toBeGreaterThan(inlet.headwaterFt);
  });

  // Worked by hand from the HDS-5 equations (no published example found for these inputs).
  it('18 in corrugated metal projecting, Q 10 cfs, n 0.024, L 40 ft, S 0.01, TW 0.5 ft: HL 2.169, dc 1.219, ho 1.359, HWo 3.129 ft', () => {
    const r = outletControlHeadwater({
      inlet: 'cmp-projecting',
      diameterFt: 1.5,
      flowCfs: 10,
      manningN: 0.024,
      lengthFt: 40,
      slopeFtPerFt: 0.01,
      tailwaterDepthFt: 0.5,
    });
    expect(r.entranceLossCoefficient).toBe(0.9);
    expect(r.headLossFt).toBeCloseTo(2.169, 3);
    expect(r.criticalDepthFt).toBeCloseTo(1.219, 3);
    expect(r.outletControlDepthFt).toBeCloseTo(1.359, 3);
    expect(r.headwaterFt).toBeCloseTo(3.129, 3);
    expect(r.tailwaterGoverns).toBe(false);
  });

  // Worked by hand from the HDS-5 equations (no published example found for these inputs).
  it('a tailwater above (dc + D)/2 sets ho: TW 2.0 ft gives HWo 3.769 ft', () => {
    const r = outletControlHeadwater({
      inlet: 'cmp-projecting',
      diameterFt: 1.5,
      flowCfs: 10,
      manningN: 0.024,
      lengthFt: 40,
      slopeFtPerFt: 0.01,
      tailwaterDepthFt: 2,
    });
    expect(r.outletControlDepthFt).toBe(2);
    expect(r.headwaterFt).toBeCloseTo(3.769, 3);
    expect(r.tailwaterGoverns).toBe(true);
  });

  // Worked by hand from the HDS-5 equations (no published example found for these inputs).
  it('smooth concrete with a square-edged headwall (ke 0.5, n 0.013) loses less: HL 1.105, HWo 2.065 ft', () => {
    const r = outletControlHeadwater({
      inlet: 'concrete-square-headwall',
      diameterFt: 1.5,
      flowCfs: 10,
      manningN: 0.013,
      lengthFt: 40,
      slopeFtPerFt: 0.01,
      tailwaterDepthFt: 0.5,
    });
    expect(r.headLossFt).toBeCloseTo(1.105, 3);
    expect(r.headwaterFt).toBeCloseTo(2.065, 3);
  });

  it("the friction term's 29 is 2g / 1.49^2 in US units (HDS-5), to within 0.1%", () => {
    expect(29 / ((2 * 32.2) / 1.49 ** 2)).toBeCloseTo(1, 2);
  });

  it('refuses a flow it cannot carry and names the field', () => {
    expect(() =>
      outletControlHeadwater({
        inlet: 'cmp-projecting',
        diameterFt: 1.5,
        flowCfs: 0,
        manningN: 0.024,
        lengthFt: 40,
        slopeFtPerFt: 0.01,
      }),
    ).toThrow(EngineInputError);
  });
});

// Worked by hand from the HDS-5 equations (no published example found for these inputs).
describe('the controlling headwater in the entrance check', () => {
  const rules = ruleProfile({ culvert: { lengthIncrementFt: 2, maxHeadwaterToDiameter: 2 } });
  const culvert = (over: object) => ({
    diameterIn: 18,
    inlet: 'cmp-projecting' as const,
    manningN: 0.024,
    inletInvertFt: 96.4,
    outletInvertFt: 96,
    lengthFt: 40,
    designFlowCfs: 10,
    ...over,
  });
  const run = (over: object) =>
    checkEntrance(
      {
        profile: profileFromRuns([
          [20, 2],
          [30, 6],
        ]),
        culvert: culvert(over),
      },
      rules,
    );

  it('takes the larger of inlet and outlet control and says which controls (HDS-5 chapter 3)', () => {
    const r = run({ tailwaterDepthFt: 0.5 });
    // Inlet control, HDS-5 Table A.1 corrugated metal projecting, submerged form: HW/D = 0.0553 x^2 + 0.54 - 0.5 S
    // with x = Q / (A D^0.5) = 4.6204, so HW/D 1.7156 and HW 2.573 ft.
    expect(r.culvert?.inletHeadwaterFt).toBeCloseTo(2.573, 3);
    expect(r.culvert?.outletHeadwaterFt).toBeCloseTo(3.129, 3);
    expect(r.culvert?.control).toBe('outlet');
    expect(r.culvert?.headwaterFt).toBeCloseTo(3.129, 3);
    const f = findingOf(r.findings, 'culvert.headwater');
    expect(f.measured).toBeCloseTo(3.129 / 1.5, 3);
    expect(f.status).toBe('fail');
    expect(f.note).toMatch(/outlet control governs/);
  });

  it('a short, steep pipe is inlet controlled', () => {
    const r = run({ lengthFt: 20, inletInvertFt: 97, tailwaterDepthFt: 0 });
    expect(r.culvert?.control).toBe('inlet');
    expect(findingOf(r.findings, 'culvert.headwater').note).toMatch(/inlet control governs/);
  });

  it('without a tailwater depth the outlet is taken as free, (dc + D)/2, and the note says so', () => {
    const r = run({});
    expect(r.culvert?.outletHeadwaterFt).toBeCloseTo(3.129 - 0, 3);
    expect(findingOf(r.findings, 'culvert.headwater').note).toMatch(/no tailwater depth given/);
  });
});
