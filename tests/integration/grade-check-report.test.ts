import { execFileSync } from 'node:child_process';
import { existsSync, mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import { emails, requestEvents } from '../../server/db/schema';
import { signInCast, type Cast } from '../factories/office-cast';
import { createRequestRow } from '../factories/request-rows';
import { createTestApp, type TestApp } from '../setup/test-app';
import { currentVersionId, pdfText, surveyInputs } from './grade-check-survey';

let t: TestApp;
let cast: Cast;
let marrow: string;
beforeAll(async () => {
  t = await createTestApp();
  cast = await signInCast(t);
  marrow = await currentVersionId(t.ctx.db, 'marrow-county');
});
afterAll(() => t.close());

async function savedAndAttached(share: boolean) {
  const request = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'visit_booked' });
  const saved = await cast.staff.agent
    .post(`/api/requests/${request.id}/grade-checks`)
    .send({ ruleProfileVersionId: marrow, inputs: surveyInputs() })
    .expect(201);
  const attached = await cast.staff.agent
    .post(`/api/grade-checks/${saved.body.check.id}/attach`)
    .send({ shareWithApplicant: share, confirmFailing: true })
    .expect(200);
  return { request, check: attached.body.check, documentId: attached.body.documentId as string };
}

describe('the grade check report', () => {
  it('holds the findings, the source notes and the cautions, and its first page is rendered for review', async () => {
    const { request, check } = await savedAndAttached(true);
    expect(check.attachedAt).not.toBeNull();
    const list = await cast.staff.agent.get(`/api/requests/${request.id}/documents`).expect(200);
    expect(list.body.documents).toHaveLength(1);
    const doc = list.body.documents[0];
    expect(doc).toMatchObject({ kind: 'grade-check-report', gradeCheckId: check.id, contentType: 'application/pdf' });
    expect(doc).not.toHaveProperty('objectKey');
    const response = await fetch(doc.url);
    expect(response.status).toBe(200);
    const bytes = Buffer.from(await response.arrayBuffer());
    expect(bytes.subarray(0, 5).toString()).toBe('%PDF-');

    const text = await pdfText(bytes);
    expect(text).toContain(`Grade check ${check.number}`);
    expect(text).toContain(request.reference);
    for (const finding of check.results.report.findings) expect(text).toContain(finding.label.slice(0, 24));
    expect(text).toMatch(/Landing grade \(rising\) 0\+00 5\.5% 4\.0% -1\.5% Does not meet/);
    expect(text).toContain('Access Standards sec. 3.2');
    expect(text).toContain('buried utilities');
    expect(text).toContain('trench-safety');
    expect(text).toContain('traffic control');
    expect(text).toMatch(/road authority's decision prevails/);
    expect(text).toContain('Least-earth proposal');
    // Plain words: the company and the checker by name, a calculation version, no internal keys or raw choices.
    expect(text).toContain('Tamarack Ridge Excavating');
    const checker = (await cast.staff.agent.get('/api/me').expect(200)).body.user.name as string;
    expect(text).toContain(`by ${checker}`);
    expect(text).toMatch(/Calculation version \d+\.\d+\.\d+/);
    expect(text).not.toMatch(/Engine \d/);
    expect(text).not.toMatch(/sight\.basis|asBuilt\.|landing\.|designVehicle\.|\bunits us\b/);
    expect(text).toContain('Landing: steepest rise away from the road');
    expect(text).toContain('US customary (ft, in)');
    expect(text).not.toMatch(/\d{4}-\d{2}-\d{2}/);
    expect(text).not.toMatch(/\ba (8|11|18)\d* in culvert/);

    const dir = path.join(inject('stack').artifactsDir, 'reports');
    mkdirSync(dir, { recursive: true });
    const pdfPath = path.join(dir, 'grade-check-report.pdf');
    writeFileSync(pdfPath, bytes);
    if (!existsSync('/usr/bin/pdftoppm')) {
      console.warn('pdftoppm is missing (Debian poppler-utils): the PNG of the first page was not made.');
      return;
    }
    execFileSync('/usr/bin/pdftoppm', [
      '-png',
      '-r',
      '60',
      '-f',
      '1',
      '-l',
      '1',
      '-singlefile',
      pdfPath,
      path.join(dir, 'grade-check-report-page1'),
    ]);
    expect(existsSync(path.join(dir, 'grade-check-report-page1.png'))).toBe(true);
  });

  it('shows the report to the owner only once shared, through links that refuse tampering', async () => {
    const { request, documentId } = await savedAndAttached(false);
    const hidden = await cast.applicant.agent.get(`/api/requests/${request.id}/documents`).expect(200);
    expect(hidden.body.documents).toHaveLength(0);
    await cast.applicant.agent.patch(`/api/documents/${documentId}`).send({ sharedWithApplicant: true }).expect(403);
    await cast.staff.agent.patch(`/api/documents/${documentId}`).send({ sharedWithApplicant: 'yes' }).expect(400);
    await cast.staff.agent.patch(`/api/documents/${documentId}`).send({ sharedWithApplicant: true }).expect(200);
    const shown = await cast.applicant.agent.get(`/api/requests/${request.id}/documents`).expect(200);
    expect(shown.body.documents).toHaveLength(1);
    await cast.otherApplicant.agent.get(`/api/requests/${request.id}/documents`).expect(404);
    const url = new URL(shown.body.documents[0].url);
    expect(Number(url.searchParams.get('X-Amz-Expires'))).toBeLessThanOrEqual(300);
    url.pathname = url.pathname.replace(/\.pdf$/, '-other.pdf');
    expect((await fetch(url)).status).toBe(403);
    const events = await t.ctx.db.select().from(requestEvents).where(eq(requestEvents.requestId, request.id));
    expect(events.filter((e) => e.kind !== 'transition').map((e) => [e.kind, e.internal])).toEqual([
      ['grade-check', true],
      ['grade-check-report', true],
      ['document', false],
    ]);
  });

  it('attaches once, then lets the request be marked checked with the summary in the owner’s e-mail', async () => {
    const { request, check, documentId } = await savedAndAttached(true);
    const again = await cast.staff.agent
      .post(`/api/grade-checks/${check.id}/attach`)
      .send({ confirmFailing: true })
      .expect(200);
    expect(again.body.documentId).toBe(documentId);
    await cast.staff.agent
      .post(`/api/requests/${request.id}/transitions`)
      .send({ action: 'mark-checked', expectedVersion: request.version })
      .expect(200);
    const sent = await t.ctx.db.select().from(emails).where(eq(emails.requestId, request.id));
    const toOwner = sent.find((e) => e.toAddress === cast.applicant.email);
    expect(toOwner?.textBody).toContain(check.summary);
  });

  it('refuses to mark a request checked without an attached check', async () => {
    const request = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'visit_booked' });
    await cast.staff.agent
      .post(`/api/requests/${request.id}/grade-checks`)
      .send({ ruleProfileVersionId: marrow, inputs: surveyInputs() })
      .expect(201);
    await cast.staff.agent
      .post(`/api/requests/${request.id}/transitions`)
      .send({ action: 'mark-checked', expectedVersion: request.version })
      .expect(409);
  });
});
