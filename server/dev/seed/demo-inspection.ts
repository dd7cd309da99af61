import { PutObjectCommand } from '@aws-sdk/client-s3';
import { and, asc, eq, isNotNull } from 'drizzle-orm';
import jpeg from 'jpeg-js';
import { randomBytes, randomUUID } from 'node:crypto';
import type { CrewPhotoKind } from '@shared/contracts/crew-photos';
import type { AppContext } from '../../config/context';
import type { Tx } from '../../db/client';
import { inspections, inspectorLinks, jobs, photos, requestEvents, requests, users } from '../../db/schema';
import { hashToken } from '../../services/inspections/inspector-links.service';

/** The demo's finished job: built, inspected by the county and closed. */
const inspectedAddress = '18 Fernhill Road, Marrow Crossing';
/** The demo's job waiting on the office's review: the crew has photographed it too. */
const builtAddress = '400 Larkspur Ridge Road, Elderbrook';
const inspector = { name: 'Hollis Varga', email: 'h.varga@marrow-county.test' };

async function findRequest(tx: Pick<AppContext, 'db'>['db'] | Tx, address: string) {
  const [row] = await tx.select().from(requests).where(eq(requests.siteAddress, address));
  return row ?? null;
}

/**
 * The closed demo request gets the inspector's link the office sent and the county's passed inspection, dated
 * between the crew marking it built and the office closing it. The link's token was e-mailed and is not kept, so the
 * demo link opens nothing; the office sends a fresh one to try the page. Left alone once there.
 */
export async function seedDemoInspection(tx: Tx) {
  const request = await findRequest(tx, inspectedAddress);
  if (!request) return;
  const [already] = await tx
    .select({ id: inspectorLinks.id })
    .from(inspectorLinks)
    .where(eq(inspectorLinks.requestId, request.id));
  if (already) return;
  const moves = await tx
    .select()
    .from(requestEvents)
    .where(and(eq(requestEvents.requestId, request.id), isNotNull(requestEvents.toStatus)))
    .orderBy(asc(requestEvents.createdAt));
  const built = moves.find((e) => e.toStatus === 'built');
  const closed = moves.find((e) => e.toStatus === 'closed');
  if (!built || !closed) return;
  const span = closed.createdAt.getTime() - built.createdAt.getTime();
  const at = (share: number) => new Date(built.createdAt.getTime() + span * share);
  const office = closed.actorId;
  if (!office) return;
  const [link] = await tx
    .insert(inspectorLinks)
    .values({
      requestId: request.id,
      tokenHash: hashToken(randomBytes(32).toString('base64url')),
      inspectorName: inspector.name,
      inspectorEmail: inspector.email,
      createdById: office,
      createdAt: at(0.3),
      expiresAt: new Date(at(0.3).getTime() + 14 * 86_400_000),
      lastOpenedAt: at(0.55),
      outcomeAt: at(0.6),
    })
    .returning();
  await tx.insert(requestEvents).values([
    {
      requestId: request.id,
      actorId: office,
      kind: 'inspector-link-sent',
      internal: true,
      note: `Link sent to ${inspector.name} <${inspector.email}>, open until ${link.expiresAt.toISOString().slice(0, 10)}.`,
      createdAt: at(0.3),
    },
    {
      requestId: request.id,
      actorId: null,
      kind: 'inspection-passed',
      note: `Passed by the road authority’s inspector, ${inspector.name}. Culvert seen before backfill; apron and ditch as permitted.`,
      createdAt: at(0.6),
    },
  ]);
  await tx.insert(inspections).values({
    requestId: request.id,
    passed: true,
    inspectorName: inspector.name,
    items: [],
    note: 'Culvert seen before backfill; apron and ditch as permitted.',
    linkId: link.id,
    createdAt: at(0.6),
  });
}

/** A small picture drawn pixel by pixel and encoded as a real JPEG: sky, ground, and the pipe or the apron. */
export function demoJpeg(kind: CrewPhotoKind, width = 160, height = 120): Buffer {
  const data = Buffer.alloc(width * height * 4);
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      let rgb: [number, number, number];
      if (y < height * 0.35) rgb = [170, 200, 225];
      else if (kind === 'culvert_before_backfill') {
        const dx = x - width / 2;
        const dy = y - height * 0.7;
        const ring = Math.hypot(dx, dy * 1.4);
        rgb = ring < 18 ? [35, 35, 40] : ring < 24 ? [150, 150, 155] : [120, 90, 60];
      } else {
        const apron = Math.abs(x - width / 2) < (y - height * 0.35) * 0.9 + 10;
        rgb = apron ? [95, 95, 100] : [85, 130, 70];
      }
      data.set([...rgb, 255], (y * width + x) * 4);
    }
  }
  return Buffer.from(jpeg.encode({ data, width, height }, 80).data);
}

/**
 * The crew's photos of the inspected and the built demo jobs: stored like any crew photo (the bytes in storage, the
 * row stored), so the office, the owner and the inspector's page show them. Runs once storage is up; a job that has
 * crew photos is left alone. Answers how many photos it added.
 */
export async function seedDemoCrewPhotos(ctx: Pick<AppContext, 'db' | 's3' | 'env'>) {
  let added = 0;
  for (const address of [inspectedAddress, builtAddress]) {
    const request = await findRequest(ctx.db, address);
    if (!request) continue;
    const [job] = await ctx.db
      .select({ crewId: jobs.crewId, builtAt: jobs.builtAt })
      .from(jobs)
      .where(eq(jobs.requestId, request.id));
    if (!job?.crewId) continue;
    const [existing] = await ctx.db
      .select({ id: photos.id })
      .from(photos)
      .where(and(eq(photos.requestId, request.id), isNotNull(photos.kind)));
    if (existing) continue;
    const [crew] = await ctx.db.select({ id: users.id }).from(users).where(eq(users.id, job.crewId));
    if (!crew) continue;
    const takenAt = job.builtAt ?? new Date();
    const shots: { kind: CrewPhotoKind; caption: string; hoursBefore: number; dLat: number }[] = [
      { kind: 'culvert_before_backfill', caption: '18 in pipe bedded, both ends set', hoursBefore: 30, dLat: 0.00002 },
      { kind: 'finished_entrance', caption: 'Finished apron from the road', hoursBefore: 2, dLat: 0 },
    ];
    for (const shot of shots) {
      const body = demoJpeg(shot.kind);
      const id = randomUUID();
      const objectKey = `requests/${request.id}/crew-photos/${id}.jpg`;
      await ctx.s3.send(
        new PutObjectCommand({ Bucket: ctx.env.S3_BUCKET, Key: objectKey, Body: body, ContentType: 'image/jpeg' }),
      );
      const at = new Date(takenAt.getTime() - shot.hoursBefore * 3_600_000);
      await ctx.db.insert(photos).values({
        id,
        requestId: request.id,
        uploaderId: crew.id,
        objectKey,
        fileName: `${shot.kind.replace(/_/g, '-')}.jpg`,
        contentType: 'image/jpeg',
        sizeBytes: body.length,
        caption: shot.caption,
        status: 'stored',
        gpsLat: request.siteLat !== null ? request.siteLat + shot.dLat : null,
        gpsLng: request.siteLng,
        kind: shot.kind,
        idempotencyKey: randomUUID(),
        createdAt: at,
        storedAt: at,
      });
      added += 1;
    }
  }
  return added;
}
