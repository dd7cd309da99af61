import { z } from 'zod';
import { criticalDepthFt } from './critical-depth';
import { EngineInputError, parseInput } from './errors';
import { inletTypes, type InletType } from './inlet-control';
import { bounded, nonNegative, positive } from './numbers';

/** Entrance loss coefficient ke for each inlet we offer: FHWA HDS-5 (3rd ed. 2012) Appendix C, Table C.2. */
export const entranceLossCoefficients: Record<InletType, number> = {
  'concrete-square-headwall': 0.5,
  'concrete-groove-headwall': 0.2,
  'concrete-groove-projecting': 0.2,
  'cmp-headwall': 0.5,
  'cmp-mitered': 0.7,
  'cmp-projecting': 0.9,
};

const TWO_G = 64.4;
// 2g / 1.49^2 rounded as HDS-5 prints it for US units.
const FRICTION_US = 29;

export const outletControlHeadwaterInputSchema = z.object({
  inlet: z.enum(inletTypes),
  diameterFt: bounded(0.25, 20),
  flowCfs: positive(10_000),
  manningN: bounded(0.005, 0.1),
  lengthFt: positive(1_000),
  slopeFtPerFt: bounded(-0.5, 0.5),
  // Depth of water in the outlet ditch above the outlet invert; none given is a free outlet.
  tailwaterDepthFt: nonNegative(50).default(0),
});
export type OutletControlHeadwaterInput = z.input<typeof outletControlHeadwaterInputSchema>;

export interface OutletControlResult {
  headwaterFt: number;
  hwOverD: number;
  headLossFt: number;
  velocityFtPerS: number;
  entranceLossCoefficient: number;
  criticalDepthFt: number;
  /** ho: the water level at the outlet the losses are added to, above the outlet invert. */
  outletControlDepthFt: number;
  tailwaterGoverns: boolean;
}

/**
 * Outlet-control headwater above the inlet invert for a circular pipe, by the HDS-5 full-flow method (chapter 3):
 * HL = [1 + ke + 29 n^2 L / R^1.33] V^2 / 2g with R = D/4, and HWo = ho + HL - S L with ho the larger of the
 * tailwater and (dc + D)/2. For a pipe flowing part full this is HDS-5's own approximation, good while HWo stays
 * above about D + (1 + ke) V^2/2g; lower headwaters would need a backwater run.
 */
export function outletControlHeadwater(input: OutletControlHeadwaterInput): OutletControlResult {
  const p = parseInput(outletControlHeadwaterInputSchema, input);
  const d = p.diameterFt;
  const area = (Math.PI * d * d) / 4;
  const velocityFtPerS = p.flowCfs / area;
  const ke = entranceLossCoefficients[p.inlet];
  const friction = (FRICTION_US * p.manningN ** 2 * p.lengthFt) / (d / 4) ** 1.33;
  const headLossFt = (1 + ke + friction) * ((velocityFtPerS * velocityFtPerS) / TWO_G);
  const dc = Math.min(criticalDepthFt(d, p.flowCfs), d);
  const freeOutlet = (dc + d) / 2;
  const outletControlDepthFt = Math.max(p.tailwaterDepthFt, freeOutlet);
  const headwaterFt = outletControlDepthFt + headLossFt - p.slopeFtPerFt * p.lengthFt;
  if (!Number.isFinite(headwaterFt))
    throw new EngineInputError('flowCfs', 'outlet-control headwater cannot be computed for this flow and pipe');
  return {
    headwaterFt,
    hwOverD: headwaterFt / d,
    headLossFt,
    velocityFtPerS,
    entranceLossCoefficient: ke,
    criticalDepthFt: dc,
    outletControlDepthFt,
    tailwaterGoverns: p.tailwaterDepthFt > freeOutlet,
  };
}
