import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import * as engine from '@shared/engine';
import {
  checkEntrance,
  commonRuralTemplate,
  EngineInputError,
  passengerCarPreset,
  proposeProfile,
  type RuleProfile,
} from '@shared/engine';
import { holdsWater } from './water';

const runs = fc.array(
  fc.tuple(fc.double({ min: 1, max: 30, noNaN: true }), fc.double({ min: -15, max: 15, noNaN: true })),
  { minLength: 1, maxLength: 12 },
);

const toProfile = (rs: [number, number][], scale = 1) => {
  const points = [{ stationFt: 0, elevationFt: 100 }];
  for (const [len, grade] of rs) {
    const last = points[points.length - 1];
    points.push({ stationFt: last.stationFt + len, elevationFt: last.elevationFt + (len * grade * scale) / 100 });
  }
  return points;
};

const rulesArb: fc.Arbitrary<RuleProfile> = fc
  .record({
    lengthFt: fc.integer({ min: 0, max: 40 }),
    landingMax: fc.double({ min: 2, max: 10, noNaN: true }),
    maxGrade: fc.double({ min: 8, max: 20, noNaN: true }),
    maxChange: fc.double({ min: 4, max: 20, noNaN: true }),
  })
  .map((r) => ({
    ...commonRuralTemplate,
    landing: { lengthFt: r.lengthFt, minGradePercent: -r.landingMax, maxGradePercent: r.landingMax },
    maxGradePercent: r.maxGrade,
    maxGradeChangePercent: r.maxChange,
  }));

// The same rules, some with a drainage minimum (the proposal must then choose each segment's direction).
const designRulesArb: fc.Arbitrary<RuleProfile> = fc
  .tuple(rulesArb, fc.option(fc.double({ min: 0.5, max: 3, noNaN: true }), { nil: undefined }))
  .map(([rules, drain]) => (drain === undefined ? rules : { ...rules, minDrainageGradePercent: drain }));

// A road side in front of the road edge: a crown or a banked road, sometimes a shoulder (slopes + fall toward the edge).
const roadSideArb = fc.option(
  fc
    .record({
      roadCrossSlopePercent: fc.double({ min: -6, max: 6, noNaN: true }),
      shoulder: fc.option(
        fc.tuple(fc.double({ min: 1, max: 10, noNaN: true }), fc.double({ min: -10, max: 10, noNaN: true })),
        { nil: undefined },
      ),
    })
    .map(({ roadCrossSlopePercent, shoulder }) =>
      shoulder
        ? { roadCrossSlopePercent, shoulderWidthFt: shoulder[0], shoulderSlopePercent: shoulder[1] }
        : { roadCrossSlopePercent },
    ),
  { nil: undefined },
);

const GRADE_RULES = ['landing.max-grade', 'landing.min-grade', 'grade.max', 'grade.max-change', 'scrape.clearance'];

/** Every number anywhere in a result must be finite: the engine never hands back NaN or Infinity. */
function allFinite(value: unknown): boolean {
  if (typeof value === 'number') return Number.isFinite(value);
  if (Array.isArray(value)) return value.every(allFinite);
  if (value && typeof value === 'object') return Object.values(value).every(allFinite);
  return true;
}

// Properties of the engine, not published values: random grounds under random limits around the common rural
// template (common practice (no source), docs/sources.md "Grades and vehicles").
describe('properties', () => {
  it('a steeper profile never passes a rule that a gentler one failed', () => {
    fc.assert(
      fc.property(runs, fc.double({ min: 1, max: 3, noNaN: true }), rulesArb, (rs, k, rules) => {
        const gentle = checkEntrance({ profile: toProfile(rs) }, rules);
        const steep = checkEntrance({ profile: toProfile(rs, k) }, rules);
        for (const id of GRADE_RULES) {
          const g = gentle.findings.find((f) => f.ruleId === id)!;
          const s = steep.findings.find((f) => f.ruleId === id)!;
          if (g.status === 'fail') expect(s.status, id).toBe('fail');
        }
        if (!gentle.passes) expect(steep.passes).toBe(false);
      }),
      { numRuns: 150 },
    );
  });

  it('a proposed profile always passes the profile rules of checkEntrance, with the same road side', async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.array(fc.tuple(fc.double({ min: 2, max: 20, noNaN: true }), fc.double({ min: -25, max: 25, noNaN: true })), {
          minLength: 3,
          maxLength: 25,
        }),
        rulesArb,
        fc.double({ min: -1, max: 1, noNaN: true }),
        fc.option(fc.double({ min: -3, max: 3, noNaN: true }), { nil: undefined }),
        roadSideArb,
        async (rs, rules, roadOffset, endOffset, roadSide) => {
          const existing = toProfile(rs);
          const end = existing[existing.length - 1].elevationFt;
          const targetEndElevationFt = endOffset === undefined ? undefined : end + endOffset;
          const r = await proposeProfile(
            { existing, roadEdgeElevationFt: 100 + roadOffset, targetEndElevationFt, roadSide },
            rules,
          );
          if (!r.feasible) {
            expect(r.reason).toBeTruthy();
            return;
          }
          if (targetEndElevationFt !== undefined)
            expect(r.profile[r.profile.length - 1].elevationFt).toBeCloseTo(targetEndElevationFt, 6);
          const check = checkEntrance({ profile: r.profile, roadSide }, rules);
          const failed = check.findings.filter((f) => f.status === 'fail');
          expect(failed).toEqual([]);
          expect(holdsWater(r.profile)).toBe(false);
          expect(r.cutCuYd).toBeGreaterThanOrEqual(0);
          expect(r.fillCuYd).toBeGreaterThanOrEqual(0);
        },
      ),
      { numRuns: 60 },
    );
  }, 120_000);

  it('never proposes worse than the ground when the ground already complies and drains', async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.array(fc.tuple(fc.double({ min: 2, max: 20, noNaN: true }), fc.double({ min: 0.6, max: 2, noNaN: true })), {
          minLength: 2,
          maxLength: 15,
        }),
        designRulesArb,
        async (rs, rules) => {
          const existing = toProfile(rs);
          const asFound = checkEntrance({ profile: existing }, rules);
          fc.pre(asFound.passes && !holdsWater(existing));
          const r = await proposeProfile({ existing, roadEdgeElevationFt: existing[0].elevationFt }, rules);
          expect(r.feasible).toBe(true);
          expect(checkEntrance({ profile: r.profile }, rules).passes).toBe(true);
          // Leaving the ground as it is moves nothing; the proposal may move no more (to 0.01 cu yd).
          expect(r.cutCuYd + r.fillCuYd).toBeLessThanOrEqual(0.01);
        },
      ),
      { numRuns: 40 },
    );
  }, 120_000);

  it('any input at all either computes or throws EngineInputError, never another error', async () => {
    const calls: ((x: unknown) => unknown)[] = [
      (x) => engine.stoppingSightDistance(x as never),
      (x) => engine.intersectionSightDistance(x as never),
      (x) => engine.pipeFullFlow(x as never),
      (x) => engine.rationalFlow(x as never),
      (x) => engine.inletControlHeadwater(x as never),
      (x) => engine.earthworkVolume(x as never),
      (x) => engine.earthworkFromProfiles(x as never),
      (x) => engine.scrapeCheck(x as never),
      (x) => engine.checkEntrance(x as never, x as never),
      (x) => engine.checkEntrance(x as never, commonRuralTemplate),
      (x) => engine.proposeProfile(x as never, commonRuralTemplate),
      (x) => engine.laserSetup(x as never),
      (x) => engine.checkAsBuilt(x as never),
      (x) => engine.classifyAsBuiltReading(x as never),
      (x) => engine.truckLoads(x as never),
      (x) => engine.normalizeProfile(x),
    ];
    await fc.assert(
      fc.asyncProperty(fc.anything(), fc.nat(calls.length - 1), async (x, i) => {
        try {
          await calls[i](x);
        } catch (e) {
          expect(e).toBeInstanceOf(EngineInputError);
        }
      }),
      { numRuns: 500 },
    );
  });

  it('inputs the schemas accept, even at their extremes, give finite answers or the typed error', () => {
    const extreme = (min: number, max: number) =>
      fc.oneof(fc.constantFrom(min, max, 0), fc.double({ min, max, noNaN: true }));
    const culvert = fc.record({
      diameterIn: extreme(0.01, 120).filter((d) => d > 0),
      manningN: extreme(0.005, 0.1),
      inletInvertFt: extreme(-2000, 30000),
      outletInvertFt: extreme(-2000, 30000),
      surfaceElevationFt: extreme(-2000, 30000),
      topWidthFt: extreme(0.01, 200).filter((d) => d > 0),
      sideSlopeHPerV: extreme(0, 20),
      lengthFt: extreme(0.01, 500).filter((d) => d > 0),
      designFlowCfs: extreme(0.01, 10000).filter((d) => d > 0),
      inlet: fc.constantFrom(...engine.inletTypes),
    });
    const sight = fc.record({
      speedMph: extreme(5, 100),
      measuredLeftFt: extreme(0, 10000),
      approachGradePercent: extreme(-50, 50),
      extraLanes: fc.integer({ min: 0, max: 10 }),
      roadGradeFromLeftPercent: extreme(-15, 15),
    });
    const points = fc.array(fc.record({ stationFt: extreme(-10000, 100000), elevationFt: extreme(-2000, 30000) }), {
      minLength: 2,
      maxLength: 8,
    });
    const vehicle = fc.record({
      wheelbaseFt: extreme(3, 60),
      frontOverhangFt: extreme(0, 20),
      rearOverhangFt: extreme(0, 20),
      clearanceIn: extreme(1, 36),
    });
    fc.assert(
      fc.property(
        points,
        fc.option(culvert, { nil: undefined }),
        fc.option(sight, { nil: undefined }),
        vehicle,
        (profile, c, s, v) => {
          try {
            const report = checkEntrance(
              { profile, culvert: c, sight: s, vehicle: { name: 'Any', ...v }, scrapeStepFt: 5 },
              commonRuralTemplate,
            );
            expect(allFinite(report)).toBe(true);
          } catch (e) {
            expect(e).toBeInstanceOf(EngineInputError);
          }
        },
      ),
      { numRuns: 300 },
    );
  });

  it('the passenger-car preset and template survive their own schema unchanged', () => {
    expect(engine.ruleProfileSchema.parse(commonRuralTemplate)).toEqual(commonRuralTemplate);
    expect(engine.designVehicleSchema.parse(passengerCarPreset)).toEqual(passengerCarPreset);
  });
});
