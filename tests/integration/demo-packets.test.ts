import { GetObjectCommand } from '@aws-sdk/client-s3';
import { eq, isNotNull } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { documents, requestEvents, requests } from '../../server/db/schema';
import { seedDemo } from '../../server/dev/seed';
import { seedDemoPackets } from '../../server/dev/seed/demo-packets';
import { seedDemoReports } from '../../server/dev/seed/demo-reports';
import { createTestApp, type TestApp } from '../setup/test-app';
import { pdfText } from './grade-check-survey';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
  await seedDemo(t.ctx.db);
  await seedDemoReports(t.ctx);
  // Seeding the demo runs its design proposals on this thread.
}, 240_000);
afterAll(() => t.close());

describe('the demo permit packets', () => {
  it('stores the packet of every demo request whose permit was filed, dated with the filing, once', async () => {
    const filed = await t.ctx.db.select().from(requests).where(isNotNull(requests.permitReference));
    expect(filed.some((r) => r.status === 'permit_filed')).toBe(true);
    expect(await seedDemoPackets(t.ctx)).toBe(filed.length);
    expect(await seedDemoPackets(t.ctx)).toBe(0);

    const request = filed.find((r) => r.status === 'permit_filed')!;
    const [packet] = await t.ctx.db
      .select()
      .from(documents)
      .where(eq(documents.requestId, request.id))
      .then((rows) => rows.filter((d) => d.kind === 'permit-packet'));
    const events = await t.ctx.db.select().from(requestEvents).where(eq(requestEvents.requestId, request.id));
    const filing = events.find((e) => e.toStatus === 'permit_filed')!;
    const linked = events.find((e) => e.kind === 'permit-packet')!;
    expect(linked.documentId).toBe(packet.id);
    expect(linked.createdAt).toEqual(filing.createdAt);
    expect(packet.createdAt).toEqual(filing.createdAt);

    const object = await t.ctx.s3.send(new GetObjectCommand({ Bucket: t.env.S3_BUCKET, Key: packet.objectKey }));
    const text = await pdfText(Buffer.from(await object.Body!.transformToByteArray()));
    expect(text).toContain(request.reference);
    expect(text).toContain(`application ${request.permitReference}`);
    expect(text).toContain('Nearest intersection (Hollis Cross Road), 420 ft');
    expect(text).toContain('Right-of-way line, 16.5 ft from road edge');
    expect(text).toContain('buried utilities');
  }, 180_000);
});
