import { GetObjectCommand } from '@aws-sdk/client-s3';
import { eq, isNotNull } from 'drizzle-orm';
import { PDFParse } from 'pdf-parse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { documents, gradeChecks, requestEvents, requests } from '../../server/db/schema';
import { seedDemo } from '../../server/dev/seed';
import { seedDemoReports } from '../../server/dev/seed/demo-reports';
import { createTestApp, signIn, type TestApp } from '../setup/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
  await seedDemo(t.ctx.db);
});
afterAll(() => t.close());

describe('the demo reports', () => {
  it('stores a shared PDF for every attached demo check, dated with the check, once', async () => {
    const attached = await t.ctx.db.select().from(gradeChecks).where(isNotNull(gradeChecks.attachedAt));
    expect(attached.length).toBeGreaterThanOrEqual(7);
    expect(await seedDemoReports(t.ctx)).toBe(attached.length);
    expect(await seedDemoReports(t.ctx)).toBe(0);

    const docs = await t.ctx.db.select().from(documents);
    expect(docs.map((d) => d.gradeCheckId).sort()).toEqual(attached.map((c) => c.id).sort());
    for (const check of attached) {
      const doc = docs.find((d) => d.gradeCheckId === check.id)!;
      expect(doc.sharedWithApplicant).toBe(true);
      expect(doc.createdAt).toEqual(check.attachedAt);
      const [event] = await t.ctx.db
        .select()
        .from(requestEvents)
        .where(eq(requestEvents.requestId, check.requestId))
        .then((rows) => rows.filter((e) => e.kind === 'grade-check-report'));
      expect(event.createdAt).toEqual(check.attachedAt);
    }

    const first = docs[0];
    const [request] = await t.ctx.db.select().from(requests).where(eq(requests.id, first.requestId));
    const object = await t.ctx.s3.send(new GetObjectCommand({ Bucket: t.env.S3_BUCKET, Key: first.objectKey }));
    const pdf = Buffer.from(await object.Body!.transformToByteArray());
    expect(pdf.length).toBe(first.sizeBytes);
    const parser = new PDFParse({ data: pdf });
    const text = (await parser.getText()).text;
    await parser.destroy();
    expect(text).toContain(request.reference);
    expect(text).toMatch(/buried utilities/i);
  });

  it('lets the demo owner open the report of their checked request', async () => {
    await seedDemoReports(t.ctx);
    const owner = await signIn(t.app, 'ellen.marsh@example.test');
    const mine = (await owner.get('/api/requests/mine').expect(200)).body.requests as { id: string }[];
    const shown = await Promise.all(
      mine.map(
        async (r) =>
          (await owner.get(`/api/requests/${r.id}/documents`).expect(200)).body.documents as { url: string }[],
      ),
    );
    const reports = shown.flat();
    expect(reports.length).toBeGreaterThan(0);
    const res = await fetch(reports[0].url);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('application/pdf');
  });
});
