import { execFileSync } from 'node:child_process';
import { existsSync, mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, inject, it, vi } from 'vitest';
import { documents, requestEvents, requests } from '../../server/db/schema';
import { signInCast, type Cast } from '../factories/office-cast';
import { createSentQuote } from '../factories/quotes';
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

const plan = {
  rightOfWayFt: 17,
  roadWidthFt: 22,
  bearingDeg: 35,
  intersectionSide: 'left',
  intersectionName: 'Orchard Rd',
  propertyLineSide: 'right',
  culvertStationFt: 6,
  culvertMaterial: 'concrete',
};

/** A request checked with an attached grade check that carries the plan view's extras, ready to file. */
async function checkedRequest(inputs = surveyInputs({ plan })) {
  const request = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'visit_booked' });
  const saved = await cast.staff.agent
    .post(`/api/requests/${request.id}/grade-checks`)
    .send({ ruleProfileVersionId: marrow, inputs })
    .expect(201);
  await cast.staff.agent
    .post(`/api/grade-checks/${saved.body.check.id}/attach`)
    .send({ confirmFailing: true })
    .expect(200);
  const marked = await cast.staff.agent
    .post(`/api/requests/${request.id}/transitions`)
    .send({ action: 'mark-checked', expectedVersion: request.version })
    .expect(200);
  return { request: { ...request, version: marked.body.request.version as number }, check: saved.body.check };
}

async function saveArtifacts(name: string, bytes: Buffer) {
  const dir = path.join(inject('stack').artifactsDir, 'permit-packet');
  mkdirSync(dir, { recursive: true });
  const pdfPath = path.join(dir, `${name}.pdf`);
  writeFileSync(pdfPath, bytes);
  if (!existsSync('/usr/bin/pdftoppm')) return;
  execFileSync('/usr/bin/pdftoppm', ['-png', '-r', '60', '-f', '1', '-l', '2', pdfPath, path.join(dir, name)]);
}

describe('the permit packet', () => {
  it('holds the applicant, the plan view’s labels, the culvert detail, the findings and the cautions', async () => {
    const { request, check } = await checkedRequest();
    for (const paper of ['letter', 'a4'] as const) {
      const answer = await cast.staff.agent
        .get(`/api/requests/${request.id}/permit-packet?paper=${paper}`)
        .buffer(true)
        .parse((res, done) => {
          const chunks: Buffer[] = [];
          res.on('data', (c: Buffer) => chunks.push(c));
          res.on('end', () => done(null, Buffer.concat(chunks)));
        })
        .expect(200)
        .expect('content-type', 'application/pdf');
      const bytes = answer.body as Buffer;
      await saveArtifacts(`packet-${paper}`, bytes);
      const text = await pdfText(bytes);
      expect(text).toContain('Driveway entrance permit application');
      expect(text).toContain(request.applicantName);
      expect(text).toContain(request.siteAddress);
      expect(text).toContain(request.reference);
      // The plan view's labels, as placed on the drawing.
      for (const label of [
        `Edge of ${request.roadName}`,
        'Looking left: 650 ft measured',
        'Looking right: 600 ft measured',
        'Road rises 1.5% this way',
        'Width 16 ft',
        'Flare radius 12 ft',
        'Culvert 18 in concrete, 30 ft',
        'Inlet, invert 98.00 ft',
        'Outlet, invert 97.70 ft',
        'Right-of-way line, 17 ft from road edge',
        'Property line, 20 ft from the entrance',
        'Nearest intersection (Orchard Rd), 300 ft',
      ])
        expect(text, label).toContain(label);
      expect(text).toContain('Plan view of the entrance');
      expect(text).toContain('Design profile');
      // The culvert detail.
      expect(text).toMatch(/Inlet invert 98\.00 ft/);
      expect(text).toMatch(/Cover over the pipe/);
      expect(text).toMatch(/Headwater \d+\.\d\d ft above the inlet invert/);
      // The findings in the rule profile's own terms.
      expect(text).toContain('Findings against Marrow County');
      for (const finding of check.results.report.findings) expect(text).toContain(finding.label.slice(0, 24));
      expect(text).toMatch(/Landing grade \(rising\) 0\+00 5\.5% 4\.0% -1\.5% Does not meet/);
      // The cautions.
      expect(text).toContain('buried utilities');
      expect(text).toContain('trench-safety');
      expect(text).toContain('traffic control');
      expect(text).toMatch(
        /supports, and never replaces, the road authority's review, local codes and a licensed engineer/,
      );
    }
  });

  it('says what the plan view leaves out for a check saved without the plan’s extras', async () => {
    const { request } = await checkedRequest(surveyInputs());
    const answer = await cast.staff.agent
      .get(`/api/requests/${request.id}/permit-packet`)
      .buffer(true)
      .parse((res, done) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => done(null, Buffer.concat(chunks)));
      })
      .expect(200);
    const text = await pdfText(answer.body as Buffer);
    expect(text).toContain('Right-of-way line not shown: its distance from the road edge was not given.');
    expect(text).toContain('Bearing not given: no north arrow.');
  });

  it('is for the office only, and refused with a clear answer before a check is attached', async () => {
    const { request } = await checkedRequest();
    await cast.applicant.agent.get(`/api/requests/${request.id}/permit-packet`).expect(403);
    await cast.staff.agent.get(`/api/requests/${request.id}/permit-packet?paper=tabloid`).expect(400);
    const bare = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'visit_booked' });
    const refused = await cast.staff.agent.get(`/api/requests/${bare.id}/permit-packet`).expect(409);
    expect(refused.body.error.message).toMatch(/Attach a grade check/);
  });

  it('is stored when the permit is filed, and linked from the office’s timeline', async () => {
    const { request } = await checkedRequest();
    await cast.staff.agent
      .post(`/api/requests/${request.id}/transitions`)
      .send({
        action: 'file-permit',
        expectedVersion: request.version,
        permitReference: 'MC-2026-0412',
        paperSize: 'a4',
      })
      .expect(200);
    const stored = await t.ctx.db.select().from(documents).where(eq(documents.requestId, request.id));
    const packet = stored.find((d) => d.kind === 'permit-packet');
    expect(packet).toMatchObject({ contentType: 'application/pdf', title: 'Permit packet, application MC-2026-0412' });
    const list = await cast.staff.agent.get(`/api/requests/${request.id}/documents`).expect(200);
    const listed = list.body.documents.find((d: { kind: string }) => d.kind === 'permit-packet');
    const bytes = Buffer.from(await (await fetch(listed.url)).arrayBuffer());
    const text = await pdfText(bytes);
    expect(text).toContain('application MC-2026-0412');
    const events = await cast.staff.agent.get(`/api/requests/${request.id}/events`).expect(200);
    const filed = events.body.events.find((e: { kind: string }) => e.kind === 'permit-packet');
    expect(filed).toMatchObject({ documentId: packet!.id, internal: true });
    expect(filed.note).toContain('(A4)');
    // The owner's timeline shows the filing, not the office's packet entry or its document.
    const ownerEvents = await cast.applicant.agent.get(`/api/requests/${request.id}/events`).expect(200);
    expect(ownerEvents.body.events.some((e: { kind: string }) => e.kind === 'permit-packet')).toBe(false);
    expect(ownerEvents.body.events.every((e: object) => !('documentId' in e))).toBe(true);
  });

  it('still records a filing made with no attached check, and says on the office’s timeline that no packet went with it', async () => {
    const row = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'checked' });
    await cast.staff.agent
      .post(`/api/requests/${row.id}/transitions`)
      .send({ action: 'file-permit', expectedVersion: row.version, permitReference: 'MC-PAPER-1' })
      .expect(200);
    const events = await t.ctx.db.select().from(requestEvents).where(eq(requestEvents.requestId, row.id));
    const note = events.find((e) => e.kind === 'permit-packet');
    expect(note).toMatchObject({ internal: true, documentId: null });
    expect(note?.note).toMatch(/^No permit packet was stored with this filing: Attach a grade check/);
  });

  it('leaves nothing recorded when the filing is refused (a stale version)', async () => {
    const { request } = await checkedRequest();
    await cast.staff.agent
      .post(`/api/requests/${request.id}/transitions`)
      .send({ action: 'file-permit', expectedVersion: request.version - 1, permitReference: 'MC-1' })
      .expect(409);
    const stored = await t.ctx.db.select().from(documents).where(eq(documents.requestId, request.id));
    expect(stored.filter((d) => d.kind === 'permit-packet')).toHaveLength(0);
    const [row] = await t.ctx.db.select().from(requests).where(eq(requests.id, request.id));
    expect(row.status).toBe('checked');
  });

  it('is not drawn or stored at all when the filing waits for the deposit', async () => {
    await cast.admin.agent
      .put('/api/settings/payment-waits')
      .send({ depositBeforePermit: true, balanceBeforeClose: false })
      .expect(200);
    const sends = vi.spyOn(t.ctx.s3, 'send');
    try {
      const { request, check } = await checkedRequest();
      const quote = await createSentQuote(t.ctx.db, {
        requestId: request.id,
        createdById: cast.staff.id,
        totalCents: 500_000,
        depositCents: 150_000,
        gradeCheckId: check.id,
      });
      await cast.applicant.agent.post(`/api/quotes/${quote.id}/accept`).send({ name: 'Ellen Marsh' }).expect(200);
      sends.mockClear();
      const refused = await cast.staff.agent
        .post(`/api/requests/${request.id}/transitions`)
        .send({ action: 'file-permit', expectedVersion: request.version, permitReference: 'MC-2' })
        .expect(409);
      expect(refused.body.error.message).toMatch(/waits for the deposit/);
      const written = sends.mock.calls.map(([command]) => command.constructor.name);
      expect(written).not.toContain('PutObjectCommand');
      expect(written).not.toContain('DeleteObjectCommand');
    } finally {
      sends.mockRestore();
      await cast.admin.agent
        .put('/api/settings/payment-waits')
        .send({ depositBeforePermit: false, balanceBeforeClose: false })
        .expect(200);
    }
  });
});

const pdfBytes = Buffer.from('%PDF-1.4\n1 0 obj <<>> endobj\ntrailer <<>>\n%%EOF\n');
const jpegBytes = Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0]), Buffer.alloc(60, 1)]);
const htmlBytes = Buffer.from('<html><script>alert(1)</script></html>');

describe('the road authority’s decision letter', () => {
  async function filedRequest() {
    const { request } = await checkedRequest();
    const filed = await cast.staff.agent
      .post(`/api/requests/${request.id}/transitions`)
      .send({ action: 'file-permit', expectedVersion: request.version, permitReference: 'MC-2026-0999' })
      .expect(200);
    return { ...request, version: filed.body.request.version as number };
  }

  async function upload(requestId: string, fileName: string, contentType: string, bytes: Buffer) {
    const presigned = await cast.staff.agent
      .post(`/api/requests/${requestId}/decision-letters`)
      .send({ fileName, contentType, sizeBytes: bytes.length })
      .expect(200);
    const put = await fetch(presigned.body.upload.url, {
      method: 'PUT',
      headers: presigned.body.upload.headers,
      body: new Uint8Array(bytes),
    });
    expect(put.status).toBe(200);
    return cast.staff.agent
      .post(`/api/requests/${requestId}/decision-letters/confirm`)
      .send({ uploadId: presigned.body.uploadId, fileName, contentType, sizeBytes: bytes.length });
  }

  it('takes a PDF and a photo of the letter, lists them and lets the office download them', async () => {
    const request = await filedRequest();
    const pdf = await upload(request.id, 'decision.pdf', 'application/pdf', pdfBytes);
    expect(pdf.status).toBe(200);
    expect(pdf.body.document).toMatchObject({ kind: 'decision-letter', contentType: 'application/pdf' });
    const photo = await upload(request.id, 'letter.jpg', 'image/jpeg', jpegBytes);
    expect(photo.status).toBe(200);
    const list = await cast.staff.agent.get(`/api/requests/${request.id}/documents`).expect(200);
    const letters = list.body.documents.filter((d: { kind: string }) => d.kind === 'decision-letter');
    expect(letters).toHaveLength(2);
    const link = await cast.staff.agent
      .get(`/api/requests/${request.id}/documents/${pdf.body.document.id}/url`)
      .expect(200);
    const downloaded = await fetch(link.body.url);
    expect(Buffer.from(await downloaded.arrayBuffer()).equals(pdfBytes)).toBe(true);
    const events = await t.ctx.db.select().from(requestEvents).where(eq(requestEvents.requestId, request.id));
    expect(events.filter((e) => e.kind === 'decision-letter').map((e) => e.documentId)).toEqual(
      expect.arrayContaining([pdf.body.document.id, photo.body.document.id]),
    );
  });

  it('refuses a web page sent as a PDF, and a PDF sent as a photo, by their first bytes', async () => {
    const request = await filedRequest();
    const html = await upload(request.id, 'letter.pdf', 'application/pdf', htmlBytes);
    expect(html.status).toBe(400);
    expect(html.body.error.fields.fileName).toBe('is not a PDF or a photo');
    const mislabelled = await upload(request.id, 'letter.png', 'image/png', pdfBytes);
    expect(mislabelled.status).toBe(400);
    const list = await cast.staff.agent.get(`/api/requests/${request.id}/documents`).expect(200);
    expect(list.body.documents.filter((d: { kind: string }) => d.kind === 'decision-letter')).toHaveLength(0);
  });

  it('names the field for a file type it does not take, and waits for the filing', async () => {
    const request = await filedRequest();
    const wrong = await cast.staff.agent
      .post(`/api/requests/${request.id}/decision-letters`)
      .send({ fileName: 'letter.docx', contentType: 'application/msword', sizeBytes: 10 })
      .expect(400);
    expect(wrong.body.error.fields.contentType).toBe('The letter must be a PDF, or a JPEG, PNG, WebP or HEIC photo.');
    const unfiled = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'checked' });
    await cast.staff.agent
      .post(`/api/requests/${unfiled.id}/decision-letters`)
      .send({ fileName: 'letter.pdf', contentType: 'application/pdf', sizeBytes: 10 })
      .expect(409);
    await cast.applicant.agent
      .post(`/api/requests/${request.id}/decision-letters`)
      .send({ fileName: 'letter.pdf', contentType: 'application/pdf', sizeBytes: 10 })
      .expect(403);
    // A confirmation for an upload that never happened finds nothing.
    await cast.staff.agent
      .post(`/api/requests/${request.id}/decision-letters/confirm`)
      .send({
        uploadId: '00000000-0000-4000-8000-000000000000',
        fileName: 'x.pdf',
        contentType: 'application/pdf',
        sizeBytes: 10,
      })
      .expect(409);
  });
});
