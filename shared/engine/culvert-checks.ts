import { z } from 'zod';
import { atLeast, atMost, advisory, type Finding, notChecked } from './findings';
import { inletControlHeadwater, inletTypes } from './inlet-control';
import { bounded, elevationFt, nonNegative, positive, roundUpTo } from './numbers';
import { pipeFullFlow, rationalFlow, rationalFlowInputSchema } from './pipe-flow';
import type { RuleProfile } from './rule-profile';

export const culvertInputSchema = z.object({
  diameterIn: positive(120),
  inlet: z.enum(inletTypes).default('concrete-square-headwall'),
  manningN: bounded(0.005, 0.1),
  inletInvertFt: elevationFt(),
  outletInvertFt: elevationFt(),
  // Finished driveway surface over the pipe; needed for cover and for the side-slope runs.
  surfaceElevationFt: elevationFt().optional(),
  wallThicknessIn: nonNegative(24).default(0),
  lengthFt: positive(500).optional(),
  topWidthFt: positive(200).optional(),
  sideSlopeHPerV: nonNegative(20).optional(),
  designFlowCfs: positive(10_000).optional(),
  drainage: rationalFlowInputSchema.optional(),
});
export type CulvertInput = z.input<typeof culvertInputSchema>;

export interface CulvertSummary {
  requiredLengthFt?: number;
  coverIn?: number;
  slopeFtPerFt?: number;
  capacityCfs?: number;
  designFlowCfs?: number;
  headwaterFt?: number;
  hwOverD?: number;
}

const base = (ruleId: string, label: string, unit: string) => ({ ruleId, label, unit });

function requiredLengthFt(c: z.output<typeof culvertInputSchema>, rules: RuleProfile): number | undefined {
  if (c.topWidthFt === undefined || c.sideSlopeHPerV === undefined || c.surfaceElevationFt === undefined) return undefined;
  // Each side-slope run falls from the surface to the ditch flow line at the pipe's end.
  const runs = c.sideSlopeHPerV * Math.max(0, c.surfaceElevationFt - c.inletInvertFt) + c.sideSlopeHPerV * Math.max(0, c.surfaceElevationFt - c.outletInvertFt);
  const raw = Math.max(c.topWidthFt + runs, rules.culvert.minLengthFt ?? 0);
  return roundUpTo(raw, rules.culvert.lengthIncrementFt);
}

export function checkCulvert(c: z.output<typeof culvertInputSchema> | undefined, rules: RuleProfile): { findings: Finding[]; culvert?: CulvertSummary } {
  const ids = {
    diameter: base('culvert.min-diameter', 'Culvert diameter', 'in'),
    length: base('culvert.length', 'Culvert length', 'ft'),
    cover: base('culvert.min-cover', 'Cover over the culvert', 'in'),
    slope: base('culvert.slope', 'Culvert slope from the inverts', 'ft/ft'),
    capacity: base('culvert.capacity', 'Culvert full-flow capacity', 'cfs'),
    headwater: base('culvert.headwater', 'Headwater at the inlet (HW/D)', 'HW/D'),
  };
  if (!c) return { findings: Object.values(ids).map((b) => notChecked(b, 'no culvert in the input')) };
  const findings: Finding[] = [];
  const summary: CulvertSummary = {};
  const d = c.diameterIn;
  findings.push(rules.culvert.minDiameterIn === undefined ? notChecked(ids.diameter, 'no minimum diameter in this rule profile') : atLeast(ids.diameter, d, rules.culvert.minDiameterIn));

  const required = requiredLengthFt(c, rules);
  summary.requiredLengthFt = required;
  if (required === undefined) findings.push(notChecked(ids.length, 'needs top width, side slope and surface elevation'));
  else if (c.lengthFt === undefined) findings.push(advisory(ids.length, null, required, `order a culvert at least ${required} ft long`));
  else findings.push(atLeast(ids.length, c.lengthFt, required));

  if (c.surfaceElevationFt === undefined) findings.push(notChecked(ids.cover, 'needs the surface elevation over the pipe'));
  else {
    // Under one surface elevation the higher end of the pipe has the least cover.
    const crownFt = Math.max(c.inletInvertFt, c.outletInvertFt) + (d + 2 * c.wallThicknessIn) / 12;
    summary.coverIn = (c.surfaceElevationFt - crownFt) * 12;
    findings.push(rules.culvert.minCoverIn === undefined ? advisory(ids.cover, summary.coverIn, null, 'no minimum cover in this rule profile') : atLeast(ids.cover, summary.coverIn, rules.culvert.minCoverIn));
  }

  const lengthForSlope = c.lengthFt ?? required;
  if (lengthForSlope === undefined) findings.push(notChecked(ids.slope, 'needs the culvert length'));
  else {
    const slope = (c.inletInvertFt - c.outletInvertFt) / lengthForSlope;
    summary.slopeFtPerFt = slope;
    // A pipe that is flat or falls toward its inlet will not drain the ditch, so zero fails here too.
    findings.push(
      slope > 0
        ? atLeast(ids.slope, slope, 0)
        : { ...ids.slope, measured: slope, limit: 0, margin: slope, status: 'fail', note: 'the outlet is not below the inlet' },
    );
  }

  const flow = c.designFlowCfs ?? (c.drainage ? rationalFlow(c.drainage).flowCfs : undefined);
  summary.designFlowCfs = flow;
  const slope = summary.slopeFtPerFt;
  if (flow === undefined || flow <= 0 || slope === undefined || slope <= 0) {
    const why = flow === undefined || flow <= 0 ? 'no design flow in the input' : 'needs a positive culvert slope';
    findings.push(notChecked(ids.capacity, why), notChecked(ids.headwater, why));
    return { findings, culvert: summary };
  }
  summary.capacityCfs = pipeFullFlow({ diameterIn: d, manningN: c.manningN, slopeFtPerFt: Math.min(slope, 1) }).flowCfs;
  findings.push(atLeast(ids.capacity, summary.capacityCfs, flow));
  const hw = inletControlHeadwater({ inlet: c.inlet, diameterFt: d / 12, flowCfs: flow, slopeFtPerFt: Math.min(slope, 0.5) });
  summary.headwaterFt = hw.headwaterFt;
  summary.hwOverD = hw.hwOverD;
  findings.push(rules.culvert.maxHeadwaterToDiameter === undefined ? advisory(ids.headwater, hw.hwOverD, null, 'no headwater limit in this rule profile') : atMost({ ...ids.headwater, note: `${hw.regime} inlet, headwater ${hw.headwaterFt.toFixed(2)} ft` }, hw.hwOverD, rules.culvert.maxHeadwaterToDiameter));
  return { findings, culvert: summary };
}
