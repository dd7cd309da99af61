import { GetObjectCommand } from '@aws-sdk/client-s3';
import { and, eq, isNotNull } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inspections, inspectorLinks, photos, requestEvents, requests } from '../../server/db/schema';
import { seedDemo } from '../../server/dev/seed';
import { seedDemoCrewPhotos } from '../../server/dev/seed/demo-inspection';
import { photoTypeOf } from '../../server/services/photos/photo-content';
import { createTestApp, type TestApp } from '../setup/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
  await seedDemo(t.ctx.db);
});
afterAll(() => t.close());

const fernhill = async () =>
  (await t.ctx.db.select().from(requests).where(eq(requests.siteAddress, '18 Fernhill Road, Marrow Crossing')))[0];

describe('the demo’s inspected entrance', () => {
  it('has a sent inspector link and a passed inspection between built and closed, once', async () => {
    const request = await fernhill();
    expect(request.status).toBe('closed');
    const links = await t.ctx.db.select().from(inspectorLinks).where(eq(inspectorLinks.requestId, request.id));
    expect(links).toHaveLength(1);
    const done = await t.ctx.db.select().from(inspections).where(eq(inspections.requestId, request.id));
    expect(done).toMatchObject([{ passed: true, linkId: links[0].id }]);
    const events = await t.ctx.db.select().from(requestEvents).where(eq(requestEvents.requestId, request.id));
    const built = events.find((e) => e.toStatus === 'built')!;
    const closed = events.find((e) => e.toStatus === 'closed')!;
    const passed = events.find((e) => e.kind === 'inspection-passed')!;
    expect(+passed.createdAt).toBeGreaterThan(+built.createdAt);
    expect(+passed.createdAt).toBeLessThan(+closed.createdAt);
    await seedDemo(t.ctx.db);
    expect(await t.ctx.db.select().from(inspectorLinks).where(eq(inspectorLinks.requestId, request.id))).toHaveLength(
      1,
    );
  });

  it('stores the crew’s photos as real JPEGs in storage, once', async () => {
    expect(await seedDemoCrewPhotos(t.ctx)).toBe(4);
    expect(await seedDemoCrewPhotos(t.ctx)).toBe(0);
    const request = await fernhill();
    const rows = await t.ctx.db
      .select()
      .from(photos)
      .where(and(eq(photos.requestId, request.id), isNotNull(photos.kind)));
    expect(rows.map((r) => r.kind).sort()).toEqual(['culvert_before_backfill', 'finished_entrance']);
    for (const row of rows) {
      const object = await t.ctx.s3.send(new GetObjectCommand({ Bucket: t.env.S3_BUCKET, Key: row.objectKey }));
      const bytes = await object.Body!.transformToByteArray();
      expect(photoTypeOf(bytes)).toBe('image/jpeg');
      expect(bytes.length).toBe(row.sizeBytes);
    }
  });
});
