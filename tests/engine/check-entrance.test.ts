import { describe, expect, it } from 'vitest';
import {
  checkEntrance,
  commonRuralTemplate,
  ENGINE_VERSION,
  EngineInputError,
  ruleProfileSchema,
} from '@shared/engine';
import { findingOf, profileFromRuns, ruleProfile } from './fixtures';

// A vehicle with no overhangs and a high body, so that these tests isolate the grade rules from scrape.
const highCar = { name: 'High car', wheelbaseFt: 11, frontOverhangFt: 0, rearOverhangFt: 0, clearanceIn: 30 };

describe('landing and maximum grade: 4% for 20 ft, 17% beyond (common practice (no source))', () => {
  const check = (landing: number, beyond: number) =>
    checkEntrance(
      {
        profile: profileFromRuns([
          [20, landing],
          [80, beyond],
        ]),
        vehicle: highCar,
      },
      commonRuralTemplate,
    ).findings;

  it('exactly 4% and 17% pass, despite floating-point elevations', () => {
    const f = check(4, 17);
    expect(findingOf(f, 'landing.max-grade').status).toBe('pass');
    expect(findingOf(f, 'grade.max').status).toBe('pass');
    expect(findingOf(f, 'grade.max').margin).toBe(0);
  });

  it('4.01% in the landing and 17.01% beyond fail, each at its station', () => {
    const f = check(4.01, 17.01);
    expect(findingOf(f, 'landing.max-grade')).toMatchObject({ status: 'fail', stationFt: 0, limit: 4, unit: '%' });
    expect(findingOf(f, 'grade.max')).toMatchObject({ status: 'fail', stationFt: 20, limit: 17 });
    expect(findingOf(f, 'grade.max').margin).toBeCloseTo(-0.01, 9);
  });

  it('a landing falling away from the road at more than 4% fails the falling limit', () => {
    expect(findingOf(check(-4.5, 10), 'landing.min-grade')).toMatchObject({ status: 'fail', limit: -4 });
  });

  it('a segment that starts inside the landing is held to the landing limit over its whole grade', () => {
    const profile = profileFromRuns([
      [15, 2],
      [15, 6],
      [40, 10],
    ]);
    const f = checkEntrance({ profile, vehicle: highCar }, commonRuralTemplate).findings;
    expect(findingOf(f, 'landing.max-grade')).toMatchObject({ status: 'fail', stationFt: 15 });
  });

  it('downhill beyond the landing counts against the maximum too', () => {
    expect(findingOf(check(-2, -18), 'grade.max').status).toBe('fail');
  });
});

describe('limits from published local codes (docs/sources.md, "Grades and vehicles")', () => {
  // A Maryland county code: first 20 ft at no more than 10%, 15% beyond. That code sets no break limit
  // here, so the schema's loosest value is used to keep it from binding.
  const maryland = ruleProfile({
    id: 'md-county',
    landing: { lengthFt: 20, minGradePercent: -10, maxGradePercent: 10 },
    maxGradePercent: 15,
    maxGradeChangePercent: 50,
  });
  // Maryland COMAR 11.04.05.05, commercial entrance: 40 ft landing at 3% or less, 6% grade, 8% maximum break.
  const comar = ruleProfile({
    id: 'comar',
    landing: { lengthFt: 40, minGradePercent: -3, maxGradePercent: 3 },
    maxGradePercent: 6,
    maxGradeChangePercent: 8,
  });

  it('a 10% landing and 15% driveway meet the Maryland county limits but not the rural template', () => {
    const profile = profileFromRuns([
      [20, 10],
      [60, 15],
    ]);
    const md = checkEntrance({ profile, vehicle: highCar }, maryland).findings;
    expect(findingOf(md, 'landing.max-grade').status).toBe('pass');
    expect(findingOf(md, 'grade.max').status).toBe('pass');
    const rural = checkEntrance({ profile, vehicle: highCar }, commonRuralTemplate).findings;
    expect(findingOf(rural, 'landing.max-grade').status).toBe('fail');
  });

  it('COMAR: a 3% landing for 40 ft then 6% passes; a 9% break fails the 8% break limit', () => {
    const ok = checkEntrance(
      {
        profile: profileFromRuns([
          [40, 3],
          [60, 6],
        ]),
        vehicle: highCar,
      },
      comar,
    ).findings;
    expect(
      ok.filter((f) => f.ruleId.startsWith('landing') || f.ruleId.startsWith('grade')).map((f) => f.status),
    ).not.toContain('fail');
    const sharp = checkEntrance(
      {
        profile: profileFromRuns([
          [40, -3],
          [60, 6],
        ]),
        vehicle: highCar,
      },
      comar,
    ).findings;
    expect(findingOf(sharp, 'grade.max-change')).toMatchObject({ status: 'fail', stationFt: 40, limit: 8 });
    expect(findingOf(sharp, 'grade.max-change').measured).toBeCloseTo(9, 9);
  });
});

describe('the report', () => {
  const profile = profileFromRuns([
    [20, 2],
    [40, 8],
    [40, 12],
  ]);

  it('returns every rule, with missing parts as not-checked rather than left out', () => {
    const r = checkEntrance({ profile }, commonRuralTemplate);
    const ids = r.findings.map((f) => f.ruleId);
    for (const id of [
      'culvert.min-diameter',
      'culvert.headwater',
      'sight.left',
      'sight.right',
      'geometry.min-width',
      'grade.min-drainage',
    ]) {
      expect(findingOf(r.findings, id).status).toBe('not-checked');
    }
    expect(new Set(ids).size).toBe(ids.length);
    expect(ids).toContain('scrape.clearance');
  });

  it('names the engine version and the rule profile id and version on the report and on each finding', () => {
    const rules = ruleProfile({ id: 'ex-county', jurisdictionName: 'Example County', version: 3 });
    const r = checkEntrance({ profile }, rules);
    expect(r.engineVersion).toBe(ENGINE_VERSION);
    expect(r).toMatchObject({ ruleProfileId: 'ex-county', ruleProfileVersion: 3, jurisdictionName: 'Example County' });
    for (const f of r.findings) expect(f).toMatchObject({ ruleProfileId: 'ex-county', ruleProfileVersion: 3 });
  });

  it('gives a plain-words summary with counts that add up', () => {
    const rules = ruleProfile({ jurisdictionName: 'Example County', version: 3 });
    const bad = checkEntrance(
      {
        profile: profileFromRuns([
          [20, 6],
          [40, 10],
        ]),
        vehicle: highCar,
      },
      rules,
    );
    expect(bad.passes).toBe(false);
    expect(bad.summary.text).toContain('does not yet meet 1 of the');
    expect(bad.summary.text).toContain('Example County (version 3)');
    expect(bad.summary.text).toContain('landing grade (rising) is 6% at station 0+00 where at most 4% is allowed');
    const s = bad.summary;
    expect(s.pass + s.fail + s.advisory + s.notChecked).toBe(bad.findings.length);
    const good = checkEntrance(
      {
        profile: profileFromRuns([
          [20, 2],
          [40, 6],
        ]),
        vehicle: highCar,
      },
      rules,
    );
    expect(good.passes).toBe(true);
    expect(good.summary.text).toMatch(/^This entrance meets all \d+ rules of Example County/);
  });

  it('says a scrape in words rather than as a negative clearance', () => {
    const r = checkEntrance(
      {
        profile: profileFromRuns([
          [20, 0],
          [40, 12],
        ]),
      },
      commonRuralTemplate,
    );
    expect(findingOf(r.findings, 'scrape.clearance').status).toBe('fail');
    expect(r.summary.text).toMatch(
      /a car would scrape at station 0\+1\d(\.\d+)? \(it is [\d.]+ in short of clearing\)/,
    );
  });

  it('re-running the same check gives the same result', () => {
    const input = { profile, sight: { speedMph: 45, measuredLeftFt: 600, measuredRightFt: 520 } };
    expect(checkEntrance(input, commonRuralTemplate)).toEqual(
      checkEntrance(structuredClone(input), commonRuralTemplate),
    );
  });

  it('ignores shots on the road before the road edge for the grade rules', () => {
    const onRoad = [
      { stationFt: -10, elevationFt: 99 },
      ...profileFromRuns([
        [20, 2],
        [40, 6],
      ]),
    ];
    const f = checkEntrance({ profile: onRoad, roadEdgeStationFt: 0, vehicle: highCar }, commonRuralTemplate).findings;
    expect(findingOf(f, 'landing.max-grade').status).toBe('pass');
  });

  it('says when the survey stops inside the landing', () => {
    const f = checkEntrance({ profile: profileFromRuns([[12, 2]]) }, commonRuralTemplate).findings;
    expect(findingOf(f, 'landing.length').status).toBe('advisory');
  });
});

describe('culvert in the check', () => {
  // 12 in minimum diameter (New York 17 NYCRR 125.8(d)) and 12 in of cover (docs/sources.md, "Culvert minimums in local codes").
  const rules = ruleProfile({
    culvert: { minDiameterIn: 12, minCoverIn: 12, lengthIncrementFt: 2, maxHeadwaterToDiameter: 1.2 },
  });
  const base = {
    diameterIn: 18,
    manningN: 0.012,
    inletInvertFt: 95.5,
    outletInvertFt: 95.2,
    surfaceElevationFt: 98,
    topWidthFt: 20,
    sideSlopeHPerV: 2,
    lengthFt: 30,
  };
  const run = (culvert: Record<string, unknown>) =>
    checkEntrance(
      {
        profile: profileFromRuns([
          [20, 2],
          [40, 6],
        ]),
        culvert: { ...base, ...culvert },
      },
      rules,
    ).findings;

  it('length is "driveway width plus four times the ditch depth" with 2:1 slopes, rounded up (local codes)', () => {
    const f = run({ inletInvertFt: 95.5, outletInvertFt: 95.5, lengthFt: 29 });
    // 20 + 4 x 2.5 = 30 ft.
    expect(findingOf(f, 'culvert.length')).toMatchObject({ status: 'fail', limit: 30 });
    expect(findingOf(run({ inletInvertFt: 95.5, outletInvertFt: 95.5, lengthFt: 30 }), 'culvert.length').status).toBe(
      'pass',
    );
  });

  it('cover is surface minus pipe crown, and the minimum diameter is checked', () => {
    const f = run({ diameterIn: 10 });
    expect(findingOf(f, 'culvert.min-diameter')).toMatchObject({ status: 'fail', measured: 10, limit: 12 });
    // 98 - (95.5 + 1.5) = 1.0 ft = 12 in: exactly at the minimum.
    expect(findingOf(run({}), 'culvert.min-cover')).toMatchObject({ status: 'pass' });
    expect(findingOf(run({}), 'culvert.min-cover').measured).toBeCloseTo(12, 9);
    expect(findingOf(run({ surfaceElevationFt: 97.9 }), 'culvert.min-cover').status).toBe('fail');
  });

  it('a pipe that does not fall toward its outlet fails the slope check', () => {
    expect(findingOf(run({ outletInvertFt: 95.6 }), 'culvert.slope').status).toBe('fail');
  });

  it('refuses inverts that make an impossibly steep pipe, and names nested fields from the culvert', () => {
    expect(() => run({ outletInvertFt: 70 })).toThrow(/culvert\.outletInvertFt/);
    expect(() => run({ drainage: { runoffC: 0.3, intensityInPerHr: 4, areaAcres: 250 } })).toThrow(
      /culvert\.drainage\.areaAcres/,
    );
  });

  it('capacity and headwater are checked once a design flow is given, here by the rational method', () => {
    const f = run({ drainage: { runoffC: 0.3, intensityInPerHr: 4, areaAcres: 5, returnPeriodYears: 25 } });
    expect(findingOf(f, 'culvert.capacity').limit).toBeCloseTo(0.33 * 4 * 5, 9);
    expect(['pass', 'fail']).toContain(findingOf(f, 'culvert.headwater').status);
    expect(findingOf(run({}), 'culvert.headwater').status).toBe('not-checked');
    const flooded = run({ designFlowCfs: 30 });
    expect(findingOf(flooded, 'culvert.capacity').status).toBe('fail');
    expect(findingOf(flooded, 'culvert.headwater').status).toBe('fail');
  });
});

describe('sight distance in the check (AASHTO ISD table, Highway Engineering Handbook Table 2.3A)', () => {
  const rules = ruleProfile({ landing: { lengthFt: 20, minGradePercent: -4, maxGradePercent: 4 } });
  const flat = profileFromRuns([
    [20, 0],
    [40, 5],
  ]);

  it('45 mph, all turns: 500 ft needed both ways; exactly 500 passes, 499 fails', () => {
    const f = checkEntrance(
      { profile: flat, sight: { speedMph: 45, measuredLeftFt: 500, measuredRightFt: 499 } },
      rules,
    ).findings;
    expect(findingOf(f, 'sight.left')).toMatchObject({ status: 'pass', limit: 500 });
    expect(findingOf(f, 'sight.right')).toMatchObject({ status: 'fail', limit: 500 });
  });

  it('right turns only: 430 ft to the left, nothing needed to the right', () => {
    const f = checkEntrance(
      { profile: flat, sight: { speedMph: 45, measuredLeftFt: 430, movements: 'right-only' } },
      rules,
    ).findings;
    expect(findingOf(f, 'sight.left')).toMatchObject({ status: 'pass', limit: 430 });
    expect(findingOf(f, 'sight.right').status).toBe('not-checked');
  });

  it('a landing falling 4% away from the road is a 4% climb out: +0.2 s on the left-turn gap, the part above 3% (AASHTO)', () => {
    const f = checkEntrance(
      {
        profile: profileFromRuns([
          [20, -4],
          [40, 5],
        ]),
        sight: { speedMph: 45, measuredLeftFt: 600 },
      },
      rules,
    ).findings;
    // 1.47 x 45 x 7.7 = 509.4 -> 510 ft.
    expect(findingOf(f, 'sight.left').limit).toBe(510);
  });

  it("the rule profile's whole-grade reading reaches the full check: +0.8 s for the same 4% climb (AASHTO, literal wording)", () => {
    const whole = ruleProfile({ sight: { basis: 'intersection', vehicle: 'passenger', gradeReading: 'whole-grade' } });
    const f = checkEntrance(
      {
        profile: profileFromRuns([
          [20, -4],
          [40, 5],
        ]),
        sight: { speedMph: 45, measuredLeftFt: 600 },
      },
      whole,
    ).findings;
    // 1.47 x 45 x 8.3 = 549.0 -> 550 ft.
    expect(findingOf(f, 'sight.left').limit).toBe(550);
  });

  it('a rule profile without the reading takes the continuous one', () => {
    expect(
      ruleProfileSchema.parse({ ...commonRuralTemplate, sight: { basis: 'intersection' } }).sight.gradeReading,
    ).toBe('above-3-percent');
  });

  it('stopping basis uses the SSD table instead (AASHTO, Highway Engineering Handbook Table 2.2)', () => {
    const ssd = ruleProfile({
      sight: { basis: 'stopping', vehicle: 'passenger', gradeReading: 'above-3-percent', designSpeedMph: 40 },
    });
    const f = checkEntrance({ profile: flat, sight: { measuredLeftFt: 305, measuredRightFt: 300 } }, ssd).findings;
    expect(findingOf(f, 'sight.left')).toMatchObject({ status: 'pass', limit: 305 });
    expect(findingOf(f, 'sight.right').status).toBe('fail');
  });
});

describe('geometry in the check', () => {
  // The limits are test values, not taken from any code.
  it('checks width, flare radius and distances against the profile, and skips what it does not set', () => {
    const rules = ruleProfile({
      geometry: { minWidthFt: 10, maxWidthFt: 24, minFlareRadiusFt: 10, minDistanceToPropertyLineFt: 5 },
    });
    const f = checkEntrance(
      {
        profile: profileFromRuns([
          [20, 0],
          [20, 5],
        ]),
        geometry: { widthFt: 26, flareRadiusFt: 10, distanceToPropertyLineFt: 4.99, distanceToIntersectionFt: 300 },
      },
      rules,
    ).findings;
    expect(findingOf(f, 'geometry.min-width').status).toBe('pass');
    expect(findingOf(f, 'geometry.max-width').status).toBe('fail');
    expect(findingOf(f, 'geometry.flare-radius').status).toBe('pass');
    expect(findingOf(f, 'geometry.property-line-distance').status).toBe('fail');
    expect(findingOf(f, 'geometry.intersection-distance').status).toBe('not-checked');
  });
});

describe('bad input', () => {
  it('names the rule-profile field that is wrong', () => {
    const bad = { ...commonRuralTemplate, maxGradePercent: -3 };
    try {
      checkEntrance(
        {
          profile: profileFromRuns([
            [20, 0],
            [20, 5],
          ]),
        },
        bad,
      );
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(EngineInputError);
      expect((e as EngineInputError).field).toBe('ruleProfile.maxGradePercent');
    }
  });

  it('refuses a landing whose minimum exceeds its maximum', () => {
    const r = ruleProfileSchema.safeParse({
      ...commonRuralTemplate,
      landing: { lengthFt: 20, minGradePercent: 5, maxGradePercent: 4 },
    });
    expect(r.success).toBe(false);
  });

  it('refuses Infinity and NaN rather than computing with them', () => {
    const profile = profileFromRuns([
      [20, 0],
      [20, 5],
    ]);
    expect(() => checkEntrance({ profile, sight: { speedMph: Infinity } }, commonRuralTemplate)).toThrow(
      EngineInputError,
    );
    expect(() => checkEntrance({ profile, geometry: { widthFt: Number.NaN } }, commonRuralTemplate)).toThrow(
      /geometry\.widthFt/,
    );
  });

  it("keeps each value's source note from the rule profile", () => {
    const parsed = ruleProfileSchema.parse(commonRuralTemplate);
    expect(parsed.sources['landing.maxGradePercent']).toBe('common practice (no source)');
    expect(parsed.sources.maxGradePercent).toBe('common practice (no source)');
  });
});
