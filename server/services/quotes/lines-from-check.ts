import { countOf } from '@shared/format/counts';
import { haulEstimate } from '@shared/charts/cut-fill-table';
import type { GradeCheckRecord } from '@shared/contracts/grade-checks';
import type { QuoteLine } from '@shared/contracts/quotes';
import {
  lineKindLabels,
  pipeMaterialLabels,
  type PipeMaterial,
  type RateCardPrices,
} from '@shared/contracts/rate-cards';

/** Two decimals at most, as a quote line holds them. */
const twoDecimals = (value: number) => Math.round(value * 100) / 100;
/** Volumes are priced by the whole cubic yard or load, rounded up: a part still needs digging or a trip. */
const wholeUp = (value: number) => Math.ceil(Math.round(value * 1e6) / 1e6);

/** The pipe material a check's Manning's n stands for (the check's form offers these three), else by its inlet. */
export function pipeMaterialOf(culvert: { manningN: number; inlet: string }): PipeMaterial {
  if (culvert.manningN === 0.024) return 'corrugated-metal';
  if (culvert.manningN === 0.012) return 'plastic';
  if (culvert.manningN === 0.013) return 'concrete';
  return culvert.inlet.startsWith('cmp') ? 'corrugated-metal' : 'concrete';
}

export interface CheckForQuote {
  number: number;
  record: GradeCheckRecord;
  /** The landing length of the rule profile the check was run against, for the base course's area without an apron. */
  landingLengthFt: number;
}

/** The landing and apron area the base course (and paving) covers, with where it came from. */
export function apronArea(check: CheckForQuote): { sqFt: number; from: string } | null {
  const { inputs, results } = check.record;
  const roadEdge = inputs.roadEdgeStationFt ?? results.report.profile.points[0]?.stationFt ?? 0;
  const apron = results.report.apron;
  if (apron) {
    const widthFt = apron.halfWidthFt * 2;
    const lengthFt = apron.warpStartStationFt - roadEdge + apron.warpLengthFt;
    if (lengthFt > 0)
      return {
        sqFt: twoDecimals(widthFt * lengthFt),
        from: `landing and apron ${twoDecimals(widthFt)} ft wide x ${twoDecimals(lengthFt)} ft from check ${check.number}`,
      };
  }
  const widthFt = inputs.apron?.entranceWidthFt ?? inputs.geometry?.widthFt;
  if (widthFt === undefined) return null;
  return {
    sqFt: twoDecimals(widthFt * check.landingLengthFt),
    from: `landing ${twoDecimals(widthFt)} ft wide x ${twoDecimals(check.landingLengthFt)} ft from check ${check.number}`,
  };
}

/**
 * A quote's first lines: the check's own quantities priced from the rate card. Each line says where its quantity
 * came from; a quantity the check does not hold comes as 0 with the reason, for the office to fill in or remove.
 */
export function linesFromCheck(check: CheckForQuote, prices: RateCardPrices): QuoteLine[] {
  const { inputs, results } = check.record;
  const n = check.number;
  const lines: QuoteLine[] = [];
  const add = (line: Omit<QuoteLine, 'taxable'> & { kind: Exclude<QuoteLine['kind'], 'other'> }) =>
    lines.push({ ...line, taxable: prices.taxable[line.kind] });

  const proposal = results.proposal;
  if (proposal) {
    const haul = haulEstimate(proposal, inputs.design?.haul);
    const cut = wholeUp(haul.cutCuYd);
    const fill = wholeUp(haul.fillCuYd);
    // A quantity the check puts at nothing is left out rather than priced at $0.00; the office can add it back.
    if (cut > 0)
      add({
        kind: 'excavation',
        description: 'Excavation (cut)',
        quantity: cut,
        unit: 'bank cu yd',
        unitPriceCents: prices.excavationPerBankCyCents,
        source: `cut ${cut} bank cy from check ${n}`,
      });
    if (fill > 0)
      add({
        kind: 'fill',
        description: 'Imported fill, placed and compacted',
        quantity: fill,
        unit: 'compacted cu yd',
        unitPriceCents: prices.fillPerCompactedCyCents,
        source: `fill ${fill} compacted cy from check ${n}`,
      });
    const countable = haul.cutLoads !== null && haul.fillLoads !== null;
    const loads = (haul.cutLoads ?? 0) + (haul.fillLoads ?? 0);
    if (loads > 0 || !countable)
      add({
        kind: 'haul',
        description: 'Haul',
        quantity: loads,
        unit: 'truck loads',
        unitPriceCents: prices.haulPerLoadCents,
        source: countable
          ? `${countOf(haul.cutLoads ?? 0, 'load')} out and ${haul.fillLoads ?? 0} in, of ${haul.truckCuYd} cu yd, from check ${n}`
          : `too many loads to count from check ${n}: enter by hand`,
      });
  } else {
    const none = `check ${n} has no least-earth design: enter by hand`;
    add({
      kind: 'excavation',
      description: 'Excavation (cut)',
      quantity: 0,
      unit: 'bank cu yd',
      unitPriceCents: prices.excavationPerBankCyCents,
      source: none,
    });
    add({
      kind: 'fill',
      description: 'Imported fill, placed and compacted',
      quantity: 0,
      unit: 'compacted cu yd',
      unitPriceCents: prices.fillPerCompactedCyCents,
      source: none,
    });
    add({
      kind: 'haul',
      description: 'Haul',
      quantity: 0,
      unit: 'truck loads',
      unitPriceCents: prices.haulPerLoadCents,
      source: none,
    });
  }

  const culvert = inputs.culvert;
  if (culvert) {
    const material = pipeMaterialOf(culvert);
    const lengthFt = culvert.lengthFt ?? results.report.culvert?.requiredLengthFt;
    const price = prices.pipes.find((p) => p.diameterIn === culvert.diameterIn && p.material === material);
    const pipeWords = `${culvert.diameterIn} in ${pipeMaterialLabels[material].toLowerCase()}`;
    const priced = price ? '' : ` (no price on the rate card for ${pipeWords}: enter one)`;
    const length = lengthFt === undefined ? 0 : twoDecimals(Math.ceil(lengthFt));
    add({
      kind: 'pipe',
      description: `Culvert pipe, ${pipeWords}`,
      quantity: length,
      unit: 'ft',
      unitPriceCents: price?.perFootCents ?? 0,
      source:
        (lengthFt === undefined
          ? `check ${n} gives no culvert length: enter by hand`
          : `${pipeWords}, ${length} ft ${culvert.lengthFt === undefined ? '(the length the rules require) ' : ''}from check ${n}`) +
        priced,
    });
    add({
      kind: 'end-sections',
      description: `End sections, ${pipeWords}`,
      quantity: 2,
      unit: 'each',
      unitPriceCents: price?.endSectionEachCents ?? 0,
      source: `one at each end of the culvert in check ${n}${priced}`,
    });
  }

  const area = apronArea(check);
  const base = prices.baseCourse;
  if (base.basis === 'square-foot') {
    add({
      kind: 'base-course',
      description: `Base course, ${base.depthIn} in deep`,
      quantity: area?.sqFt ?? 0,
      unit: 'sq ft',
      unitPriceCents: base.priceCents,
      source: area ? `${area.sqFt} sq ft: ${area.from}` : `check ${n} gives no entrance width: enter by hand`,
    });
  } else {
    const tons = area ? twoDecimals(((area.sqFt * base.depthIn) / 12 / 27) * base.tonsPerCy) : 0;
    add({
      kind: 'base-course',
      description: `Base course, ${base.depthIn} in deep`,
      quantity: tons,
      unit: 'tons',
      unitPriceCents: base.priceCents,
      source: area
        ? `${area.sqFt} sq ft x ${base.depthIn} in at ${base.tonsPerCy} tons per cu yd: ${area.from}`
        : `check ${n} gives no entrance width: enter by hand`,
    });
  }
  if (prices.pavingPerSqFtCents !== null) {
    add({
      kind: 'paving',
      description: 'Paving (optional: remove if not wanted)',
      quantity: area?.sqFt ?? 0,
      unit: 'sq ft',
      unitPriceCents: prices.pavingPerSqFtCents,
      source: area ? `${area.sqFt} sq ft: ${area.from}` : `check ${n} gives no entrance width: enter by hand`,
    });
  }
  add({
    kind: 'mobilisation',
    description: lineKindLabels.mobilisation,
    quantity: 1,
    unit: 'each',
    unitPriceCents: prices.mobilisationCents,
    source: 'one trip in and out (rate card)',
  });
  add({
    kind: 'traffic-control',
    description: 'Traffic control in the right-of-way',
    quantity: prices.trafficControlDays,
    unit: prices.trafficControlDays === 1 ? 'day' : 'days',
    unitPriceCents: prices.trafficControlPerDayCents,
    source: `${prices.trafficControlDays} ${prices.trafficControlDays === 1 ? 'day' : 'days'} on a usual job (rate card)`,
  });
  add({
    kind: 'permit-fee',
    description: 'Road authority permit fee (passed through at cost)',
    quantity: 1,
    unit: 'each',
    unitPriceCents: prices.permitFeeCents,
    source: 'the road authority’s fee (rate card)',
  });
  return lines;
}
