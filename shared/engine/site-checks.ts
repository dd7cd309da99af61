import { z } from 'zod';
import { atLeast, atMost, type Finding, notChecked } from './findings';
import { bounded, nonNegative } from './numbers';
import type { RuleProfile } from './rule-profile';
import { intersectionSightDistance, stoppingSightDistance } from './sight-distance';

export const sightInputSchema = z.object({
  speedMph: bounded(5, 100).optional(),
  measuredLeftFt: nonNegative(10_000).optional(),
  measuredRightFt: nonNegative(10_000).optional(),
  // + rising toward the road for a car pulling out; when absent it is taken from the surveyed landing.
  approachGradePercent: bounded(-50, 50).optional(),
  extraLanes: z.number().int().min(0).max(10).default(0),
  movements: z.enum(['all', 'right-only']).default('all'),
  // Grade under traffic arriving from the left (+ uphill for it); traffic from the right sees the opposite.
  roadGradeFromLeftPercent: bounded(-15, 15).default(0),
});
export type SightInput = z.input<typeof sightInputSchema>;

export const geometryInputSchema = z.object({
  widthFt: nonNegative(200).optional(),
  flareRadiusFt: nonNegative(200).optional(),
  distanceToIntersectionFt: nonNegative(10_000).optional(),
  distanceToPropertyLineFt: nonNegative(10_000).optional(),
});
export type GeometryInput = z.input<typeof geometryInputSchema>;

export interface SightSummary {
  basis: 'stopping' | 'intersection';
  speedMph: number;
  requiredLeftFt: number;
  requiredRightFt: number | null;
}

/**
 * Looking left a driver meets traffic in the near lane, which both turns cross or join, so the longer
 * left-turn gap governs there; looking right only a left turn meets traffic (far lane). A right-only
 * entrance therefore needs nothing to the right.
 */
function required(s: z.output<typeof sightInputSchema>, rules: RuleProfile, speedMph: number, approach: number) {
  if (rules.sight.basis === 'stopping') {
    const g = s.roadGradeFromLeftPercent;
    return {
      left: stoppingSightDistance({ speedMph, gradePercent: g }).designFt,
      right: s.movements === 'all' ? stoppingSightDistance({ speedMph, gradePercent: -g }).designFt : null,
    };
  }
  const common = {
    speedMph,
    vehicle: rules.sight.vehicle,
    approachGradePercent: approach,
    gradeReading: rules.sight.gradeReading,
  };
  const leftTurn = intersectionSightDistance({ ...common, turn: 'left', extraLanes: s.extraLanes }).designFt;
  const rightTurn = intersectionSightDistance({ ...common, turn: 'right' }).designFt;
  return s.movements === 'all' ? { left: leftTurn, right: leftTurn } : { left: rightTurn, right: null };
}

export function checkSight(
  s: z.output<typeof sightInputSchema> | undefined,
  rules: RuleProfile,
  landingApproachPercent: number,
): { findings: Finding[]; sight?: SightSummary } {
  const left = { ruleId: 'sight.left', label: 'Sight distance looking left', unit: 'ft' };
  const right = { ruleId: 'sight.right', label: 'Sight distance looking right', unit: 'ft' };
  const speedMph = s?.speedMph ?? rules.sight.designSpeedMph;
  if (!s || speedMph === undefined) {
    const why = !s ? 'no sight-distance measurements in the input' : 'no road speed in the input or the rule profile';
    return { findings: [notChecked(left, why), notChecked(right, why)] };
  }
  const req = required(s, rules, speedMph, s.approachGradePercent ?? landingApproachPercent);
  const findings = [
    s.measuredLeftFt === undefined ? notChecked(left, 'not measured') : atLeast(left, s.measuredLeftFt, req.left),
    req.right === null
      ? notChecked(right, 'right turns only: nothing to see to the right')
      : s.measuredRightFt === undefined
        ? notChecked(right, 'not measured')
        : atLeast(right, s.measuredRightFt, req.right),
  ];
  return {
    findings,
    sight: { basis: rules.sight.basis, speedMph, requiredLeftFt: req.left, requiredRightFt: req.right },
  };
}

export function checkGeometry(g: z.output<typeof geometryInputSchema> | undefined, rules: RuleProfile): Finding[] {
  const r = rules.geometry;
  const rows: { ruleId: string; label: string; value?: number; limit?: number; kind: 'min' | 'max' }[] = [
    {
      ruleId: 'geometry.min-width',
      label: 'Entrance width (narrowest allowed)',
      value: g?.widthFt,
      limit: r.minWidthFt,
      kind: 'min',
    },
    {
      ruleId: 'geometry.max-width',
      label: 'Entrance width (widest allowed)',
      value: g?.widthFt,
      limit: r.maxWidthFt,
      kind: 'max',
    },
    {
      ruleId: 'geometry.flare-radius',
      label: 'Flare or return radius',
      value: g?.flareRadiusFt,
      limit: r.minFlareRadiusFt,
      kind: 'min',
    },
    {
      ruleId: 'geometry.intersection-distance',
      label: 'Distance to the nearest intersection',
      value: g?.distanceToIntersectionFt,
      limit: r.minDistanceToIntersectionFt,
      kind: 'min',
    },
    {
      ruleId: 'geometry.property-line-distance',
      label: 'Distance to the property line',
      value: g?.distanceToPropertyLineFt,
      limit: r.minDistanceToPropertyLineFt,
      kind: 'min',
    },
  ];
  return rows.map(({ value, limit, kind, ...b }) => {
    const fb = { ...b, unit: 'ft' };
    if (value === undefined) return notChecked(fb, 'not given in the input');
    if (limit === undefined) return notChecked(fb, 'this rule profile sets no limit');
    return kind === 'min' ? atLeast(fb, value, limit) : atMost(fb, value, limit);
  });
}
