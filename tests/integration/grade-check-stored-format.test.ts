import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { gradeChecks } from '../../server/db/schema';
import { buildChartInputFor } from '@shared/charts/chart-input';
import { defaultHaul } from '@shared/charts/cut-fill-table';
import { profileChartSvg } from '@shared/charts/profile-chart';
import { GRADE_CHECK_FORMAT_VERSION } from '@shared/contracts/grade-checks';
import type { FieldSheetView } from '@shared/crew/crew-views';
import { readGradeCheckRecord } from '@shared/grade-check/stored-check';
import { createReleasedJob, harlowRules } from '../factories/crew-jobs';
import { type Cast, withCastApp } from '../factories/office-cast';
import type { TestApp } from '../setup/test-app';

let t: TestApp;
let cast: Cast;
withCastApp((app, signedIn) => {
  t = app;
  cast = signedIn;
});

// Every part of FieldSheetView; a key added on one side and not the other fails here.
const sheetKeys: (keyof FieldSheetView)[] = [
  'job',
  'access',
  'permit',
  'check',
  'rules',
  'laser',
  'culvert',
  'apron',
  'design',
  'plan',
  'earthwork',
  'cautions',
];

describe('a check saved before the format version', () => {
  it('reads, upgraded, for the office and the crew alike', async () => {
    // The crew factory stores the older shape: a bare list of points, no haul choice, no format version.
    const job = await createReleasedJob(t.ctx.db, { applicantId: cast.applicant.id, staffId: cast.staff.id });
    const [row] = await t.ctx.db.select().from(gradeChecks).where(eq(gradeChecks.id, job.gradeCheckId));
    expect(row.formatVersion).toBe(1);
    expect(row.inputs).not.toHaveProperty(['design', 'haul']);

    const office = await cast.staff.agent.get(`/api/grade-checks/${row.id}`).expect(200);
    expect(office.body.check.formatVersion).toBe(GRADE_CHECK_FORMAT_VERSION);
    expect(office.body.check.inputs.design).toMatchObject({ applied: false, haul: defaultHaul });
    expect(office.body.check.results).toEqual(row.results);

    const sheet = (await cast.crew.agent.get(`/api/crew/jobs/${job.id}/field-sheet`).expect(200))
      .body as FieldSheetView;
    expect(Object.keys(sheet).sort()).toEqual([...sheetKeys].sort());
    expect(sheet.check).toMatchObject({ number: row.number, summary: row.summary, passed: row.passed });
    expect(sheet.design?.points).toEqual(readGradeCheckRecord(row).results.report.profile.points);
    // A check saved before the plan's extras still has its plan view, with the notes saying what it lacks.
    expect(sheet.plan?.rightOfWayFt).toBeUndefined();
    expect(sheet.plan?.drivewayLengthFt).toBeGreaterThan(0);
  });
});

describe('the field sheet', () => {
  it('carries a chart input for shared/charts, which draws the check screen and the report, from the same record', async () => {
    const job = await createReleasedJob(t.ctx.db, { applicantId: cast.applicant.id, staffId: cast.staff.id });
    const [row] = await t.ctx.db.select().from(gradeChecks).where(eq(gradeChecks.id, job.gradeCheckId));
    const record = readGradeCheckRecord(row);
    const sheet = (await cast.crew.agent.get(`/api/crew/jobs/${job.id}/field-sheet`).expect(200))
      .body as FieldSheetView;
    const ground = sheet.design!.existing!;
    expect(sheet.design?.chart).toEqual(
      JSON.parse(JSON.stringify(buildChartInputFor(record.inputs, record.results, harlowRules, ground))),
    );
    // What the crew builds is the design line, over the ground as surveyed; the proposal nobody applied is not drawn.
    expect(sheet.design?.chart).toMatchObject({
      ground,
      design: record.results.report.profile.points,
      checked: 'design',
    });
    const svg = profileChartSvg(sheet.design!.chart);
    expect(svg).toMatch(/^<svg [^>]*role="img"/);
    expect(svg).toContain(`Landing ${harlowRules.landing.lengthFt} ft`);
  });
});
