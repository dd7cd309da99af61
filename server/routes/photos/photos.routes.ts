import { Router } from 'express';
import { z } from 'zod';
import {
  photoCaptionInputSchema,
  photoConfirmInputSchema,
  photoUploadInputSchema,
  type PhotoLinkAnswer,
  type PhotoView,
} from '@shared/contracts/photos';
import type { AppContext } from '../../config/context';
import { notFound } from '../../lib/errors';
import { handle, uuidParam } from '../../lib/handle';
import { requireRole } from '../../middleware/require-role';
import { loadVisibleRequest } from '../../services/requests/request-access';
import {
  confirmUpload,
  listStored,
  presignUpload,
  removePhoto,
  setCaption,
  viewSeconds,
  viewUrl,
  type PhotoRow,
} from '../../services/photos/photos.service';

const photoParams = z.object({ id: z.uuid('must be a valid id'), photoId: z.uuid('must be a valid id') });

/** What a photo looks like to its readers: never the storage key, never anything read from the file itself. */
const photoView = (photo: PhotoRow, url?: string): PhotoView<Date> => ({
  id: photo.id,
  fileName: photo.fileName,
  contentType: photo.contentType,
  sizeBytes: photo.sizeBytes,
  caption: photo.caption,
  gpsLat: photo.gpsLat,
  gpsLng: photo.gpsLng,
  createdAt: photo.createdAt,
  storedAt: photo.storedAt,
  ...(url ? { url, urlExpiresInSeconds: viewSeconds } : {}),
});

export function photosRouter(ctx: AppContext) {
  const { db } = ctx;
  const router = Router();
  const owner = requireRole('applicant');

  router.get(
    '/api/requests/:id/photos',
    handle({ params: uuidParam }, async ({ params, user }) => {
      await loadVisibleRequest(db, user, params.id);
      const rows = await listStored(db, params.id);
      return { photos: await Promise.all(rows.map(async (p) => photoView(p, await viewUrl(ctx, p)))) };
    }),
  );

  router.get(
    '/api/requests/:id/photos/:photoId/url',
    handle({ params: photoParams }, async ({ params, user }) => {
      await loadVisibleRequest(db, user, params.id);
      const photo = (await listStored(db, params.id)).find((p) => p.id === params.photoId);
      if (!photo) throw notFound('Photo');
      return { url: await viewUrl(ctx, photo), expiresInSeconds: viewSeconds } satisfies PhotoLinkAnswer;
    }),
  );

  router.post(
    '/api/requests/:id/photos',
    owner,
    handle({ params: uuidParam, body: photoUploadInputSchema }, async ({ params, body, user, res }) => {
      const { photo, upload } = await presignUpload(ctx, user, params.id, body);
      res.status(201);
      return { photo: photoView(photo), upload };
    }),
  );

  router.post(
    '/api/requests/:id/photos/:photoId/confirm',
    owner,
    handle({ params: photoParams, body: photoConfirmInputSchema }, async ({ params, body, user }) => {
      const photo = await confirmUpload(ctx, user, params.id, params.photoId, body);
      return { photo: photoView(photo, await viewUrl(ctx, photo)) };
    }),
  );

  router.patch(
    '/api/requests/:id/photos/:photoId',
    owner,
    handle({ params: photoParams, body: photoCaptionInputSchema }, async ({ params, body, user }) => ({
      photo: photoView(await setCaption(db, user, params.id, params.photoId, body.caption)),
    })),
  );

  router.delete(
    '/api/requests/:id/photos/:photoId',
    owner,
    handle({ params: photoParams }, async ({ params, user }) => {
      await removePhoto(ctx, user, params.id, params.photoId);
    }),
  );
  return router;
}
