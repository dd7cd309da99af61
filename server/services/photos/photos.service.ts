import { DeleteObjectCommand, GetObjectCommand, HeadObjectCommand, PutObjectCommand } from '@aws-sdk/client-s3';
import { getSignedUrl } from '@aws-sdk/s3-request-presigner';
import { and, asc, eq, gt, inArray, isNotNull, isNull, or } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import { maxPhotosPerRequest, photoExtensions, type photoContentTypes } from '@shared/requests/photo-rules';
import { photosEditable } from '@shared/contracts/photos';
import type { SessionUser } from '../../lib/session-user';
import type { AppContext } from '../../config/context';
import type { Db, DbOrTx } from '../../db/client';
import { photos } from '../../db/schema';
import { badRequest, conflict, notFound } from '../../lib/errors';
import { loadVisibleRequest } from '../requests/request-access';
import { photoTypeOf, readLeadingBytes } from './photo-content';

/** What reaching the photo bucket takes, from the app's context. */
export type Storage = Pick<AppContext, 's3' | 'env'>;
type PhotoContext = Pick<AppContext, 'db' | 's3' | 'env'>;
export type PhotoRow = typeof photos.$inferSelect;

export const uploadSeconds = 300;
export const viewSeconds = 300;

/** The owner's own request, in a status that still takes photos; others get 404, late changes 409. */
export async function loadOwnEditable(tx: DbOrTx, user: SessionUser, requestId: string) {
  const row = await loadVisibleRequest(tx, user, requestId, { forUpdate: true });
  if (row.applicantId !== user.id) throw notFound('Request');
  if (!photosEditable(row.status))
    throw conflict('Photos can no longer be changed on this request. Send the office a message instead.');
  return row;
}

/** Which photos a question is about: the owner's site photos, or the crew's photos of the work (they carry a kind). */
export type PhotoSet = 'site' | 'crew';
const inSet = (set: PhotoSet) => (set === 'crew' ? isNotNull(photos.kind) : isNull(photos.kind));

/** How many photos of a set a request holds, counting an upload that was never confirmed only until its URL expired. */
export async function countHeldPhotos(tx: DbOrTx, requestId: string, set: PhotoSet) {
  const recent = new Date(Date.now() - uploadSeconds * 1000);
  const counted = await tx
    .select({ id: photos.id })
    .from(photos)
    .where(
      and(
        eq(photos.requestId, requestId),
        inSet(set),
        or(eq(photos.status, 'stored'), and(eq(photos.status, 'pending'), gt(photos.createdAt, recent))),
      ),
    );
  return counted.length;
}

/** A URL to put the announced photo into storage. Signing type and length means storage refuses any other file. */
export async function presignPhotoPut(ctx: Storage, photo: Pick<PhotoRow, 'objectKey' | 'contentType' | 'sizeBytes'>) {
  const command = new PutObjectCommand({
    Bucket: ctx.env.S3_BUCKET,
    Key: photo.objectKey,
    ContentType: photo.contentType,
    ContentLength: photo.sizeBytes,
  });
  const url = await getSignedUrl(ctx.s3, command, {
    expiresIn: uploadSeconds,
    signableHeaders: new Set(['content-type']),
  });
  return {
    method: 'PUT' as const,
    url,
    headers: { 'content-type': photo.contentType },
    expiresInSeconds: uploadSeconds,
  };
}

/** One photo of a request and set, locked for a change; a removed one is not found. */
export async function loadPhotoForUpdate(tx: DbOrTx, requestId: string, photoId: string, set: PhotoSet) {
  const [photo] = await tx
    .select()
    .from(photos)
    .where(and(eq(photos.id, photoId), eq(photos.requestId, requestId), inSet(set)))
    .for('update');
  if (!photo || photo.status === 'removed') throw notFound('Photo');
  return photo;
}

/** Inside a transaction, once storage holds the file: the photo is listed, with what the confirmation added. */
export async function markPhotoStored(
  tx: DbOrTx,
  photo: PhotoRow,
  extra: { caption?: string; gpsLat?: number | null; gpsLng?: number | null },
) {
  const [stored] = await tx
    .update(photos)
    .set({
      status: 'stored',
      storedAt: photo.storedAt ?? new Date(),
      caption: extra.caption ?? photo.caption,
      gpsLat: extra.gpsLat ?? photo.gpsLat,
      gpsLng: extra.gpsLng ?? photo.gpsLng,
    })
    .where(eq(photos.id, photo.id))
    .returning();
  return stored;
}

export async function presignUpload(
  ctx: PhotoContext,
  user: SessionUser,
  requestId: string,
  file: { fileName: string; contentType: (typeof photoContentTypes)[number]; sizeBytes: number },
) {
  return ctx.db.transaction(async (tx) => {
    await loadOwnEditable(tx, user, requestId);
    if ((await countHeldPhotos(tx, requestId, 'site')) >= maxPhotosPerRequest) {
      throw badRequest(`A request can have at most ${maxPhotosPerRequest} photos. Remove one to add another.`, {
        fileName: `at most ${maxPhotosPerRequest} photos per request`,
      });
    }
    const id = randomUUID();
    const objectKey = `requests/${requestId}/photos/${id}.${photoExtensions[file.contentType]}`;
    const [photo] = await tx
      .insert(photos)
      .values({ id, requestId, uploaderId: user.id, objectKey, ...file })
      .returning();
    return { photo, upload: await presignPhotoPut(ctx, photo) };
  });
}

/** The stored object must be exactly the announced file, and a photo by its own first bytes, whatever it was called. */
export async function checkStoredFile(ctx: PhotoContext, photo: PhotoRow) {
  const head = await ctx.s3
    .send(new HeadObjectCommand({ Bucket: ctx.env.S3_BUCKET, Key: photo.objectKey }))
    .catch((error: { name?: string }) => {
      if (error.name === 'NotFound' || error.name === 'NoSuchKey') return null;
      throw error;
    });
  if (!head) throw conflict('The photo has not reached storage. Upload it again.');
  if (head.ContentLength !== photo.sizeBytes || head.ContentType !== photo.contentType) {
    throw conflict('The stored file is not the one that was announced. Upload it again.');
  }
  if (photoTypeOf(await readLeadingBytes(ctx, photo.objectKey)) === photo.contentType) return;
  // Not a photo (an SVG or a web page sent as an image, say): it must never be listed or served.
  await ctx.db.update(photos).set({ status: 'removed' }).where(eq(photos.id, photo.id));
  await ctx.s3.send(new DeleteObjectCommand({ Bucket: ctx.env.S3_BUCKET, Key: photo.objectKey }));
  throw badRequest(
    `"${photo.fileName}" is not a JPEG, PNG, WebP or HEIC photo, so it was not added. Choose a photo file instead.`,
    {
      fileName: 'is not a JPEG, PNG, WebP or HEIC photo',
    },
  );
}

/**
 * Lists a photo only once storage holds the file that was announced. Storage is read between two short
 * transactions, so no row lock is held while waiting on the network.
 */
export async function confirmUpload(
  ctx: PhotoContext,
  user: SessionUser,
  requestId: string,
  photoId: string,
  extra: { caption?: string; gpsLat?: number | null; gpsLng?: number | null },
) {
  const announced = await ctx.db.transaction(async (tx) => {
    await loadOwnEditable(tx, user, requestId);
    return loadPhotoForUpdate(tx, requestId, photoId, 'site');
  });
  await checkStoredFile(ctx, announced);
  return ctx.db.transaction(async (tx) => {
    await loadOwnEditable(tx, user, requestId);
    const photo = await loadPhotoForUpdate(tx, requestId, photoId, 'site');
    return markPhotoStored(tx, photo, extra);
  });
}

export async function setCaption(db: Db, user: SessionUser, requestId: string, photoId: string, caption: string) {
  return db.transaction(async (tx) => {
    await loadOwnEditable(tx, user, requestId);
    await loadPhotoForUpdate(tx, requestId, photoId, 'site');
    const [row] = await tx.update(photos).set({ caption }).where(eq(photos.id, photoId)).returning();
    return row;
  });
}

export async function removePhoto(ctx: PhotoContext, user: SessionUser, requestId: string, photoId: string) {
  const photo = await ctx.db.transaction(async (tx) => {
    await loadOwnEditable(tx, user, requestId);
    const row = await loadPhotoForUpdate(tx, requestId, photoId, 'site');
    await tx.update(photos).set({ status: 'removed' }).where(eq(photos.id, photoId));
    return row;
  });
  await ctx.s3.send(new DeleteObjectCommand({ Bucket: ctx.env.S3_BUCKET, Key: photo.objectKey }));
}

export async function listStored(db: DbOrTx, requestId: string) {
  return db
    .select()
    .from(photos)
    .where(and(eq(photos.requestId, requestId), inArray(photos.status, ['stored']), isNull(photos.kind)))
    .orderBy(asc(photos.createdAt));
}

/** A name safe inside a quoted header value: anything outside plain letters, digits, dot and dash becomes a dash. */
const headerSafeName = (name: string) => name.replace(/[^\w.-]+/g, '-').slice(0, 120) || 'photo';

/**
 * A short-lived link to the stored photo. Storage is told to answer with the checked image type and an inline
 * disposition, whatever the object's own metadata says, so the file is only ever shown as the image it is.
 */
export function viewUrl(store: Storage, photo: PhotoRow) {
  return getSignedUrl(
    store.s3,
    new GetObjectCommand({
      Bucket: store.env.S3_BUCKET,
      Key: photo.objectKey,
      ResponseContentType: photo.contentType,
      ResponseContentDisposition: `inline; filename="${headerSafeName(photo.fileName)}"`,
    }),
    { expiresIn: viewSeconds },
  );
}
