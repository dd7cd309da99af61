import { Router } from 'express';
import { z } from 'zod';
import {
  crewPhotoConfirmInputSchema,
  crewPhotoUploadInputSchema,
  type CrewPhotosAnswer,
  type CrewPhotoTicket,
  type CrewPhotoView,
} from '@shared/contracts/crew-photos';
import type { AppContext } from '../../config/context';
import { handle, uuidParam } from '../../lib/handle';
import { requireRole } from '../../middleware/require-role';
import { loadVisibleRequest } from '../../services/requests/request-access';
import {
  confirmCrewPhoto,
  listCrewPhotos,
  registerCrewPhoto,
  removeCrewPhoto,
  type CrewPhotoRow,
} from '../../services/photos/crew-photos.service';
import { viewSeconds, viewUrl } from '../../services/photos/photos.service';

const photoParams = z.object({ id: z.uuid('must be a valid id'), photoId: z.uuid('must be a valid id') });

/** A crew photo as its readers see it: never the storage key, never the device's key, nothing read from the file. */
export const crewPhotoView = (photo: CrewPhotoRow, url?: string): CrewPhotoView<Date> => ({
  id: photo.id,
  kind: photo.kind,
  takenBy: photo.takenBy,
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

/** The crew's photos of the finished entrance and of the culvert before backfill. */
export function crewPhotosRouter(ctx: AppContext) {
  const router = Router();
  const crewOnly = requireRole('crew');

  router.get(
    '/api/requests/:id/crew-photos',
    handle({ params: uuidParam }, async ({ params, user }) => {
      await loadVisibleRequest(ctx.db, user, params.id);
      const rows = await listCrewPhotos(ctx.db, params.id);
      const listed = await Promise.all(
        rows.map(async (p) => ({ ...crewPhotoView(p), url: await viewUrl(ctx, p), urlExpiresInSeconds: viewSeconds })),
      );
      return { photos: listed } satisfies CrewPhotosAnswer<Date>;
    }),
  );

  router.post(
    '/api/crew/jobs/:id/photos',
    crewOnly,
    handle({ params: uuidParam, body: crewPhotoUploadInputSchema }, async ({ params, body, user, res }) => {
      const { photo, upload, replayed } = await registerCrewPhoto(ctx, user, params.id, body);
      res.status(replayed ? 200 : 201);
      return { photo: crewPhotoView(photo), upload, replayed } satisfies CrewPhotoTicket<Date>;
    }),
  );

  router.post(
    '/api/crew/jobs/:id/photos/:photoId/confirm',
    crewOnly,
    handle({ params: photoParams, body: crewPhotoConfirmInputSchema }, async ({ params, body, user }) => {
      const photo = await confirmCrewPhoto(ctx, user, params.id, params.photoId, body);
      return { photo: crewPhotoView(photo, await viewUrl(ctx, photo)) };
    }),
  );

  router.delete(
    '/api/crew/jobs/:id/photos/:photoId',
    crewOnly,
    handle({ params: photoParams }, async ({ params, user }) => {
      await removeCrewPhoto(ctx, user, params.id, params.photoId);
    }),
  );
  return router;
}
