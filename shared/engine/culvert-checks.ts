import { z } from 'zod';
import { EngineInputError, within } from './errors';
import { atLeast, atMost, advisory, type Finding, notChecked } from './findings';
import { controllingHeadwater } from './culvert-headwater';
import { inletTypes } from './inlet-control';
import { bounded, elevationFt, nonNegative, positive, roundUpTo } from './numbers';
import { pipeFullFlow, rationalFlow, rationalFlowInputSchema } from './pipe-flow';
import type { RuleProfile } from './rule-profile';

export const culvertInputSchema = z.object({
  // 3 in is the smallest pipe the headwater equations are run for.
  diameterIn: bounded(3, 120),
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
  // Water standing in the outlet ditch above the outlet invert, for outlet control; none given is a free outlet.
  tailwaterDepthFt: nonNegative(50).optional(),
  drainage: rationalFlowInputSchema.optional(),
});
export type CulvertInput = z.input<typeof culvertInputSchema>;

export interface CulvertSummary {
  requiredLengthFt?: number;
  coverIn?: number;
  slopeFtPerFt?: number;
  capacityCfs?: number;
  designFlowCfs?: number;
  /** The controlling headwater, the larger of inlet and outlet control, and which one it is. */
  headwaterFt?: number;
  hwOverD?: number;
  control?: 'inlet' | 'outlet';
  inletHeadwaterFt?: number;
  outletHeadwaterFt?: number;
}

const base = (ruleId: string, label: string, unit: string) => ({ ruleId, label, unit });

type Culvert = z.output<typeof culvertInputSchema>;

// A culvert laid steeper than this is not a driveway culvert; the headwater equations stop at it too.
const MAX_SLOPE_FT_PER_FT = 0.5;

function requiredLengthFt(c: Culvert, rules: RuleProfile): number | undefined {
  if (c.topWidthFt === undefined || c.sideSlopeHPerV === undefined || c.surfaceElevationFt === undefined)
    return undefined;
  // Each side-slope run falls from the surface to the ditch flow line at that end of the pipe.
  const fallIn = Math.max(0, c.surfaceElevationFt - c.inletInvertFt);
  const fallOut = Math.max(0, c.surfaceElevationFt - c.outletInvertFt);
  const raw = Math.max(c.topWidthFt + c.sideSlopeHPerV * (fallIn + fallOut), rules.culvert.minLengthFt ?? 0);
  return roundUpTo(raw, rules.culvert.lengthIncrementFt);
}

const IDS = {
  diameter: base('culvert.min-diameter', 'Culvert diameter', 'in'),
  length: base('culvert.length', 'Culvert length', 'ft'),
  cover: base('culvert.min-cover', 'Cover over the culvert', 'in'),
  slope: base('culvert.slope', 'Culvert slope from the inverts', 'ft/ft'),
  capacity: base('culvert.capacity', 'Culvert full-flow capacity', 'cfs'),
  headwater: base('culvert.headwater', 'Headwater above the inlet, inlet or outlet control (HW/D)', 'HW/D'),
};

function sizeFindings(c: Culvert, rules: RuleProfile, summary: CulvertSummary): Finding[] {
  const findings: Finding[] = [];
  const minDiameter = rules.culvert.minDiameterIn;
  findings.push(
    minDiameter === undefined
      ? notChecked(IDS.diameter, 'no minimum diameter in this rule profile')
      : atLeast(IDS.diameter, c.diameterIn, minDiameter),
  );

  const required = requiredLengthFt(c, rules);
  summary.requiredLengthFt = required;
  if (required === undefined)
    findings.push(notChecked(IDS.length, 'needs top width, side slope and surface elevation'));
  else if (c.lengthFt === undefined)
    findings.push(advisory(IDS.length, null, required, `order a culvert at least ${required} ft long`));
  else findings.push(atLeast(IDS.length, c.lengthFt, required));

  if (c.surfaceElevationFt === undefined)
    findings.push(notChecked(IDS.cover, 'needs the surface elevation over the pipe'));
  else {
    // Under one surface elevation the higher end of the pipe has the least cover. The invert is the inside
    // bottom, so the top of the pipe is one inside diameter and one wall above it (the lower wall is below it).
    const crownFt = Math.max(c.inletInvertFt, c.outletInvertFt) + (c.diameterIn + c.wallThicknessIn) / 12;
    const coverIn = (c.surfaceElevationFt - crownFt) * 12;
    summary.coverIn = coverIn;
    const minCover = rules.culvert.minCoverIn;
    findings.push(
      minCover === undefined
        ? advisory(IDS.cover, coverIn, null, 'no minimum cover in this rule profile')
        : atLeast(IDS.cover, coverIn, minCover),
    );
  }
  return findings;
}

function slopeFinding(c: Culvert, summary: CulvertSummary): Finding {
  const lengthFt = c.lengthFt ?? summary.requiredLengthFt;
  if (lengthFt === undefined) return notChecked(IDS.slope, 'needs the culvert length');
  const slope = (c.inletInvertFt - c.outletInvertFt) / lengthFt;
  if (slope > MAX_SLOPE_FT_PER_FT) {
    throw new EngineInputError(
      'culvert.outletInvertFt',
      `the inverts give a slope of ${slope.toFixed(3)} ft/ft, steeper than a culvert is laid`,
    );
  }
  summary.slopeFtPerFt = slope;
  // A pipe that is flat or falls toward its inlet will not drain the ditch, so zero fails here too.
  if (slope <= 0)
    return {
      ...IDS.slope,
      measured: slope,
      limit: 0,
      margin: slope,
      limitKind: 'at-least',
      status: 'fail',
      note: 'the outlet is not below the inlet',
    };
  return atLeast(IDS.slope, slope, 0);
}

function flowFindings(c: Culvert, rules: RuleProfile, summary: CulvertSummary): Finding[] {
  const flow =
    c.designFlowCfs ?? (c.drainage ? within('culvert.drainage', () => rationalFlow(c.drainage!).flowCfs) : undefined);
  summary.designFlowCfs = flow;
  const slope = summary.slopeFtPerFt;
  if (flow === undefined || flow <= 0 || slope === undefined || slope <= 0) {
    const why = flow === undefined || flow <= 0 ? 'no design flow in the input' : 'needs a positive culvert slope';
    return [notChecked(IDS.capacity, why), notChecked(IDS.headwater, why)];
  }
  const capacity = within(
    'culvert',
    () => pipeFullFlow({ diameterIn: c.diameterIn, manningN: c.manningN, slopeFtPerFt: slope }).flowCfs,
  );
  summary.capacityCfs = capacity;
  const hw = controllingHeadwater(c, flow, slope, c.lengthFt ?? summary.requiredLengthFt);
  Object.assign(summary, {
    headwaterFt: hw.headwaterFt,
    hwOverD: hw.hwOverD,
    control: hw.control,
    inletHeadwaterFt: hw.inletHeadwaterFt,
    outletHeadwaterFt: hw.outletHeadwaterFt,
  });
  const limit = rules.culvert.maxHeadwaterToDiameter;
  const note = hw.note;
  return [
    atLeast(IDS.capacity, capacity, flow),
    limit === undefined
      ? advisory(IDS.headwater, hw.hwOverD, null, `no headwater limit in this rule profile; ${note}`)
      : atMost({ ...IDS.headwater, note }, hw.hwOverD, limit),
  ];
}

/** Size, length, cover, slope, capacity and headwater of the entrance culvert; all not-checked without one. */
export function checkCulvert(
  c: Culvert | undefined,
  rules: RuleProfile,
): { findings: Finding[]; culvert?: CulvertSummary } {
  if (!c) return { findings: Object.values(IDS).map((b) => notChecked(b, 'no culvert in the input')) };
  const summary: CulvertSummary = {};
  const findings = [...sizeFindings(c, rules, summary), slopeFinding(c, summary), ...flowFindings(c, rules, summary)];
  return { findings, culvert: summary };
}
