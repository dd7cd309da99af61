import { describe, expect, it } from 'vitest';
import { checkEntrance, commonRuralTemplate, proposeProfile, segmentGrades } from '@shared/engine';
import { findingOf, profileFromRuns, ruleProfile } from './fixtures';

const profileFindings = (profile: { stationFt: number; elevationFt: number }[], rules = commonRuralTemplate) =>
  checkEntrance({ profile }, rules).findings.filter((f) => /^(landing|grade|scrape)\./.test(f.ruleId));

// Limits are the common rural template (common practice (no source), docs/sources.md "Grades and vehicles"); every
// proposal is judged by checkEntrance itself, the scrape by the geometry in "Vertical transitions".
describe('least-earth proposal (linear programme, HiGHS)', () => {
  it('leaves a ground profile that already complies untouched and moves no earth', async () => {
    const existing = profileFromRuns([
      [10, 2],
      [10, 2],
      [20, 6],
      [20, 8],
      [20, 8],
    ]);
    const r = await proposeProfile({ existing, roadEdgeElevationFt: 100 }, commonRuralTemplate);
    expect(r.feasible).toBe(true);
    for (const s of r.cutFillByStation) expect(Math.abs(s.cutFillFt)).toBeLessThan(1e-5);
    expect(r.cutCuYd + r.fillCuYd).toBeLessThan(0.01);
  });

  it('holds the road-edge elevation and the target end elevation', async () => {
    const existing = profileFromRuns([
      [20, 10],
      [40, 12],
      [40, 12],
    ]);
    const r = await proposeProfile(
      { existing, roadEdgeElevationFt: 100.2, targetEndElevationFt: 108 },
      commonRuralTemplate,
    );
    expect(r.feasible).toBe(true);
    expect(r.profile[0].elevationFt).toBeCloseTo(100.2, 6);
    expect(r.profile[r.profile.length - 1].elevationFt).toBeCloseTo(108, 6);
    for (const f of profileFindings(r.profile)) expect(f.status).not.toBe('fail');
  });

  it('cuts a steep bank down to the limits and reports cut at each station', async () => {
    const existing = profileFromRuns([
      [20, 12],
      [20, 22],
      [20, 22],
      [20, 10],
    ]);
    const r = await proposeProfile({ existing, roadEdgeElevationFt: 100 }, commonRuralTemplate);
    expect(r.feasible).toBe(true);
    const grades = segmentGrades(r.profile);
    expect(grades.filter((g) => g.fromStationFt < 20).every((g) => g.gradePercent <= 4 + 1e-9)).toBe(true);
    expect(grades.every((g) => Math.abs(g.gradePercent) <= 17 + 1e-9)).toBe(true);
    expect(r.cutCuYd).toBeGreaterThan(0);
    expect(r.cutFillByStation.some((s) => s.cutFillFt > 0)).toBe(true);
    for (const f of profileFindings(r.profile)) expect(f.status).not.toBe('fail');
  });

  it('adds a station where the landing ends so the design can break there', async () => {
    const existing = profileFromRuns([
      [15, 4],
      [15, 10],
      [30, 10],
    ]);
    const r = await proposeProfile({ existing, roadEdgeElevationFt: 100 }, commonRuralTemplate);
    expect(r.profile.map((p) => p.stationFt)).toContain(20);
  });

  it('says in words which limit makes a climb impossible', async () => {
    const existing = profileFromRuns([
      [20, 0],
      [180, 20],
    ]);
    const rules = ruleProfile({
      maxGradePercent: 15,
      landing: { lengthFt: 0, minGradePercent: -4, maxGradePercent: 4 },
    });
    const r = await proposeProfile({ existing, roadEdgeElevationFt: 100, targetEndElevationFt: 140 }, rules);
    expect(r.feasible).toBe(false);
    expect(r.reason).toMatch(/^the 15% limit cannot climb 40 ft in 200 ft/);
  });

  it('says when the grade-change limit, not the grade, is what fails', async () => {
    const existing = profileFromRuns([
      [20, 0],
      [20, 0],
      [20, 0],
    ]);
    // 4% landing for 20 ft, then 17% is within the grade limits, but a 1% break limit cannot bend up in time.
    const rules = ruleProfile({ maxGradeChangePercent: 1 });
    const r = await proposeProfile({ existing, roadEdgeElevationFt: 100, targetEndElevationFt: 106 }, rules);
    expect(r.feasible).toBe(false);
    expect(r.reason).toContain('1% grade-change limit');
  });

  it('tightens the bends until the design vehicle clears (scrape is not linear)', async () => {
    // The template allows a 13% break, which drags a 5 ft rear overhang; the proposal must still clear.
    const existing = profileFromRuns([
      [20, 0],
      [60, 17],
    ]);
    const r = await proposeProfile({ existing, roadEdgeElevationFt: 100 }, commonRuralTemplate);
    expect(r.feasible).toBe(true);
    const check = checkEntrance({ profile: r.profile }, commonRuralTemplate);
    expect(findingOf(check.findings, 'scrape.clearance').status).toBe('pass');
  });
});
