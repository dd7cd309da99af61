import { DeleteObjectCommand } from '@aws-sdk/client-s3';
import { and, asc, eq, isNotNull } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import { photoExtensions, type photoContentTypes } from '@shared/requests/photo-rules';
import {
  crewPhotoStatuses,
  maxCrewPhotosPerJob,
  type CrewPhotoKind,
  type CrewPhotoUploadInput,
} from '@shared/contracts/crew-photos';
import { statusText } from '@shared/workflow/statuses';
import type { SessionUser } from '../../lib/session-user';
import type { AppContext } from '../../config/context';
import type { DbOrTx } from '../../db/client';
import { photos, users } from '../../db/schema';
import { badRequest, conflict, notFound } from '../../lib/errors';
import { loadVisibleRequest } from '../requests/request-access';
import {
  checkStoredFile,
  countHeldPhotos,
  loadPhotoForUpdate,
  markPhotoStored,
  presignPhotoPut,
  type PhotoRow,
} from './photos.service';

type PhotoContext = Pick<AppContext, 'db' | 's3' | 'env'>;
export type CrewPhotoRow = PhotoRow & { kind: CrewPhotoKind; takenBy: string };

/** The crew that holds the job, while it builds or has just built it; others get 404, other statuses 409. */
async function loadOwnJob(tx: DbOrTx, user: SessionUser, requestId: string) {
  const row = await loadVisibleRequest(tx, user, requestId, { forUpdate: true });
  if (row.crewId !== user.id) throw notFound('Request');
  if (!crewPhotoStatuses.includes(row.status)) {
    throw conflict(
      `Crew photos are added while the job is being built or once it is built; this one is "${statusText[row.status].label}" (${row.status}).`,
    );
  }
  return row;
}

async function withTaker(db: DbOrTx, photo: PhotoRow): Promise<CrewPhotoRow> {
  const [taker] = await db.select({ name: users.name }).from(users).where(eq(users.id, photo.uploaderId));
  return { ...photo, kind: photo.kind as CrewPhotoKind, takenBy: taker?.name ?? '' };
}

const sameFile = (photo: PhotoRow, input: CrewPhotoUploadInput) =>
  photo.kind === input.kind &&
  photo.contentType === input.contentType &&
  photo.sizeBytes === input.sizeBytes &&
  photo.uploaderId !== null;

/**
 * Registers a crew photo under the device's idempotency key and answers a URL to upload it to. The same key again
 * answers the same photo: stored already (nothing to upload), or still waiting (a fresh URL for it). A key seen
 * before is honoured whatever the job's status now is, so a queue sent late never loses or doubles a photo.
 */
export async function registerCrewPhoto(
  ctx: PhotoContext,
  user: SessionUser,
  requestId: string,
  input: CrewPhotoUploadInput & { contentType: (typeof photoContentTypes)[number] },
) {
  const found = await ctx.db.transaction(async (tx) => {
    await loadVisibleRequest(tx, user, requestId);
    const [existing] = await tx
      .select()
      .from(photos)
      .where(and(eq(photos.requestId, requestId), eq(photos.idempotencyKey, input.idempotencyKey)));
    if (existing) {
      if (existing.uploaderId !== user.id || !sameFile(existing, input)) {
        throw conflict('This photo key was already used for a different photo. Make a new key for each photo.', {
          idempotencyKey: 'already used for a different photo',
        });
      }
      return { photo: existing, replayed: true };
    }
    await loadOwnJob(tx, user, requestId);
    if ((await countHeldPhotos(tx, requestId, 'crew')) >= maxCrewPhotosPerJob) {
      throw badRequest(`A job can have at most ${maxCrewPhotosPerJob} crew photos. Remove one to add another.`, {
        fileName: `at most ${maxCrewPhotosPerJob} crew photos per job`,
      });
    }
    const id = randomUUID();
    // Two sends of one key at once: the unique index lets one row in, and both answer it.
    const [inserted] = await tx
      .insert(photos)
      .values({
        id,
        requestId,
        uploaderId: user.id,
        objectKey: `requests/${requestId}/crew-photos/${id}.${photoExtensions[input.contentType]}`,
        fileName: input.fileName,
        contentType: input.contentType,
        sizeBytes: input.sizeBytes,
        caption: input.caption ?? '',
        gpsLat: input.gpsLat ?? null,
        gpsLng: input.gpsLng ?? null,
        kind: input.kind,
        idempotencyKey: input.idempotencyKey,
      })
      .onConflictDoNothing({ target: [photos.requestId, photos.idempotencyKey] })
      .returning();
    if (inserted) return { photo: inserted, replayed: false };
    const [winner] = await tx
      .select()
      .from(photos)
      .where(and(eq(photos.requestId, requestId), eq(photos.idempotencyKey, input.idempotencyKey)));
    return { photo: winner, replayed: true };
  });
  const { photo, replayed } = found;
  if (photo.status === 'removed') {
    throw conflict('This photo was removed. Take it again to add it.', { idempotencyKey: 'the photo was removed' });
  }
  const upload = photo.status === 'stored' ? null : await presignPhotoPut(ctx, photo);
  return { photo: await withTaker(ctx.db, photo), upload, replayed };
}

/** Lists the photo once storage holds exactly the announced photo. Confirming a stored photo again answers it. */
export async function confirmCrewPhoto(
  ctx: PhotoContext,
  user: SessionUser,
  requestId: string,
  photoId: string,
  extra: { caption?: string; gpsLat?: number | null; gpsLng?: number | null },
) {
  const announced = await ctx.db.transaction(async (tx) => {
    await loadVisibleRequest(tx, user, requestId);
    const photo = await loadPhotoForUpdate(tx, requestId, photoId, 'crew');
    if (photo.uploaderId !== user.id) throw notFound('Photo');
    return photo;
  });
  if (announced.status === 'stored') return withTaker(ctx.db, announced);
  await checkStoredFile(ctx, announced);
  const stored = await ctx.db.transaction(async (tx) => {
    const photo = await loadPhotoForUpdate(tx, requestId, photoId, 'crew');
    return markPhotoStored(tx, photo, extra);
  });
  return withTaker(ctx.db, stored);
}

/** The crew takes back a photo of its own while it may still add them. */
export async function removeCrewPhoto(ctx: PhotoContext, user: SessionUser, requestId: string, photoId: string) {
  const photo = await ctx.db.transaction(async (tx) => {
    await loadOwnJob(tx, user, requestId);
    const row = await loadPhotoForUpdate(tx, requestId, photoId, 'crew');
    if (row.uploaderId !== user.id) throw notFound('Photo');
    await tx.update(photos).set({ status: 'removed' }).where(eq(photos.id, photoId));
    return row;
  });
  await ctx.s3.send(new DeleteObjectCommand({ Bucket: ctx.env.S3_BUCKET, Key: photo.objectKey }));
}

/** Every stored crew photo of a request, oldest first, with the name of the crew lead who took it. */
export async function listCrewPhotos(db: DbOrTx, requestId: string): Promise<CrewPhotoRow[]> {
  const rows = await db
    .select({ photo: photos, takenBy: users.name })
    .from(photos)
    .innerJoin(users, eq(users.id, photos.uploaderId))
    .where(and(eq(photos.requestId, requestId), eq(photos.status, 'stored'), isNotNull(photos.kind)))
    .orderBy(asc(photos.createdAt));
  return rows.map(({ photo, takenBy }) => ({ ...photo, kind: photo.kind as CrewPhotoKind, takenBy }));
}
