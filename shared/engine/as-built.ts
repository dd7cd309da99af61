import { z } from 'zod';
import { parseInput } from './errors';
import { snap, stationFt, elevationFt, gradePercent, nonNegative, bounded } from './numbers';
import { elevationAt, profileInputSchema, normalizeParsedProfile, type ProfilePoint } from './profile';
import { ruleProfileSchema } from './rule-profile';
import { stationBefore } from './station-tolerance';
import { ENGINE_VERSION } from './version';

export type AsBuiltStatus = 'pass' | 'advisory' | 'fail';

export const classifyAsBuiltReadingInputSchema = z.object({
  measured: bounded(-1e6, 1e6),
  limit: bounded(-1e6, 1e6),
  tolerance: nonNegative(1e6),
  // 'max': the value may not exceed the limit; 'min': it may not fall below it.
  kind: z.enum(['max', 'min']),
});

/**
 * At or inside the limit passes; beyond it but within the as-built tolerance is advisory (built close enough
 * for the inspector to judge); beyond limit + tolerance fails. Values are snapped to 1e-9 first so that
 * floating noise never moves a reading across a boundary.
 */
export function classifyAsBuiltReading(input: z.input<typeof classifyAsBuiltReadingInputSchema>): {
  status: AsBuiltStatus;
  margin: number;
} {
  const p = parseInput(classifyAsBuiltReadingInputSchema, input);
  const over = p.kind === 'max' ? snap(p.measured - p.limit) : snap(p.limit - p.measured);
  const tolerance = snap(p.tolerance);
  const status: AsBuiltStatus = over <= 0 ? 'pass' : over <= tolerance ? 'advisory' : 'fail';
  return { status, margin: -over };
}

const readingSchema = z.union([
  z.object({ stationFt: stationFt(), gradePercent: gradePercent() }),
  z.object({ stationFt: stationFt(), elevationFt: elevationFt() }),
]);

export const checkAsBuiltInputSchema = z.object({
  readings: z.array(readingSchema).min(1).max(5_000),
  ruleProfile: ruleProfileSchema,
  // With a design profile, elevation readings are also held to the elevation tolerance.
  design: profileInputSchema.optional(),
  roadEdgeStationFt: stationFt().default(0),
});
export type CheckAsBuiltInput = z.input<typeof checkAsBuiltInputSchema>;

export interface AsBuiltReadingResult {
  stationFt: number;
  ruleId: string;
  measured: number;
  limit: number;
  unit: string;
  status: AsBuiltStatus;
  margin: number;
}

const worst = (a: AsBuiltStatus, b: AsBuiltStatus): AsBuiltStatus =>
  a === 'fail' || b === 'fail' ? 'fail' : a === 'advisory' || b === 'advisory' ? 'advisory' : 'pass';

interface GradeAt {
  stationFt: number;
  grade: number;
}

/**
 * Each finished-grade reading checked against the rule profile with its as-built tolerance: the landing limits or
 * the maximum grade by station, the drainage minimum beyond the landing, and the change of grade at each elevation
 * shot between two others against the grade-change limit.
 */
export function checkAsBuilt(input: CheckAsBuiltInput) {
  const p = parseInput(checkAsBuiltInputSchema, input);
  const rules = p.ruleProfile;
  const tol = rules.asBuilt;
  const landingEnd = p.roadEdgeStationFt + rules.landing.lengthFt;
  const results: AsBuiltReadingResult[] = [];
  const classify = (
    stationFt: number,
    ruleId: string,
    limit: number,
    kind: 'max' | 'min',
    measured: number,
  ): AsBuiltReadingResult => {
    const c = classifyAsBuiltReading({ measured, limit, tolerance: tol.gradeTolerancePercent, kind });
    return { stationFt, ruleId, measured, limit, unit: '%', ...c };
  };
  const gradeResult = ({ stationFt, grade }: GradeAt) => {
    if (stationBefore(stationFt, landingEnd)) {
      const hi = classify(stationFt, 'landing.max-grade', rules.landing.maxGradePercent, 'max', grade);
      const lo = classify(stationFt, 'landing.min-grade', rules.landing.minGradePercent, 'min', grade);
      results.push(hi.margin <= lo.margin ? hi : lo);
      return;
    }
    results.push(classify(stationFt, 'grade.max', rules.maxGradePercent, 'max', Math.abs(grade)));
    if (rules.minDrainageGradePercent !== undefined) {
      results.push(classify(stationFt, 'grade.min-drainage', rules.minDrainageGradePercent, 'min', Math.abs(grade)));
    }
  };
  const grades: GradeAt[] = [];
  const elevations: ProfilePoint[] = [];
  for (const r of p.readings) {
    if ('gradePercent' in r) grades.push({ stationFt: r.stationFt, grade: r.gradePercent });
    else elevations.push({ stationFt: r.stationFt, elevationFt: r.elevationFt });
  }
  const shots = elevations.length >= 2 ? normalizeParsedProfile(elevations, 'readings') : elevations;
  for (let i = 0; i < shots.length - 1; i++) {
    const a = shots[i];
    const b = shots[i + 1];
    grades.push({
      stationFt: a.stationFt,
      grade: ((b.elevationFt - a.elevationFt) / (b.stationFt - a.stationFt)) * 100,
    });
  }
  grades.sort((a, b) => a.stationFt - b.stationFt);
  grades.forEach(gradeResult);
  // A break is where two grades meet at one shot, so only the elevation shots show one; two digital-level
  // readings taken apart say nothing about how the grade turned between them.
  for (let i = 1; i < shots.length - 1; i++) {
    const before = (shots[i].elevationFt - shots[i - 1].elevationFt) / (shots[i].stationFt - shots[i - 1].stationFt);
    const after = (shots[i + 1].elevationFt - shots[i].elevationFt) / (shots[i + 1].stationFt - shots[i].stationFt);
    results.push(
      classify(
        shots[i].stationFt,
        'grade.max-change',
        rules.maxGradeChangePercent,
        'max',
        Math.abs(after - before) * 100,
      ),
    );
  }
  if (p.design) {
    const design = normalizeParsedProfile(p.design, 'design');
    for (const s of shots) {
      const off = Math.abs(s.elevationFt - elevationAt(design, s.stationFt));
      // The elevation tolerance is itself the limit: there is no further allowance beyond it.
      const c = classifyAsBuiltReading({ measured: off, limit: tol.elevationToleranceFt, tolerance: 0, kind: 'max' });
      results.push({
        stationFt: s.stationFt,
        ruleId: 'as-built.elevation',
        measured: off,
        limit: tol.elevationToleranceFt,
        unit: 'ft',
        ...c,
      });
    }
  }
  const overall = results.reduce<AsBuiltStatus>((acc, r) => worst(acc, r.status), 'pass');
  return {
    engineVersion: ENGINE_VERSION,
    ruleProfileId: rules.id,
    ruleProfileVersion: rules.version,
    readings: results,
    status: overall,
    passes: overall !== 'fail',
  };
}
