import { z } from 'zod';
import type { RequestStatus } from '../workflow/statuses';
import { maxPhotoBytes, photoCaptionSchema, photoContentTypes } from '../requests/photo-rules';
import type { PhotoView, UploadTicket } from './photos';
import type { Moment } from './wire';

/** What a crew photo shows: the two views an inspector asks for. */
export const crewPhotoKinds = ['finished_entrance', 'culvert_before_backfill'] as const;
export type CrewPhotoKind = (typeof crewPhotoKinds)[number];
export const crewPhotoKindLabels: Record<CrewPhotoKind, string> = {
  finished_entrance: 'Finished entrance',
  culvert_before_backfill: 'Culvert before backfill',
};

/** The crew adds photos while it builds and once it has marked the job built (until the office closes it). */
export const crewPhotoStatuses: readonly RequestStatus[] = ['under_construction', 'built'];
export const maxCrewPhotosPerJob = 30;

const coordinate = (limit: number, words: string) =>
  z.number({ error: 'Must be a number.' }).min(-limit, words).max(limit, words).nullable().optional();

/**
 * POST /api/crew/jobs/:id/photos: the file about to be uploaded. `idempotencyKey` is made by the device when the
 * photo is taken (a UUID): sending the same key again, after a lost answer or from an offline queue, answers the same
 * photo rather than adding a second one.
 */
export const crewPhotoUploadInputSchema = z.strictObject({
  idempotencyKey: z.uuid({ error: 'Must be a UUID made by the device for this photo.' }),
  kind: z.enum(crewPhotoKinds, {
    error: 'Choose what the photo shows: the finished entrance or the culvert before backfill.',
  }),
  fileName: z
    .string({ error: 'This is required.' })
    .trim()
    .min(1, 'The file needs a name.')
    .max(200, 'Keep file names under 200 characters.'),
  contentType: z.enum(photoContentTypes, { error: 'Photos must be JPEG, PNG, WebP or HEIC images.' }),
  sizeBytes: z
    .number({ error: 'Must be the file size in bytes.' })
    .int('Must be a whole number of bytes.')
    .min(1, 'The file is empty.')
    .max(maxPhotoBytes, 'Photos may be at most 15 MB each.'),
  caption: photoCaptionSchema.optional(),
  gpsLat: coordinate(90, 'Latitude is between -90 and 90.'),
  gpsLng: coordinate(180, 'Longitude is between -180 and 180.'),
});
export type CrewPhotoUploadInput = z.input<typeof crewPhotoUploadInputSchema>;

/** POST /api/crew/jobs/:id/photos/:photoId/confirm, once the bytes are in storage. Confirming twice is harmless. */
export const crewPhotoConfirmInputSchema = z.strictObject({
  caption: photoCaptionSchema.optional(),
  gpsLat: coordinate(90, 'Latitude is between -90 and 90.'),
  gpsLng: coordinate(180, 'Longitude is between -180 and 180.'),
});
export type CrewPhotoConfirmInput = z.input<typeof crewPhotoConfirmInputSchema>;

export interface CrewPhotoView<When extends Moment = string> extends PhotoView<When> {
  kind: CrewPhotoKind;
  /** The crew lead's name: the company's own people, never contact details. */
  takenBy: string;
}

/**
 * The answer to a registration. `upload` is null when the key's photo is already stored (nothing to send again);
 * otherwise it is a fresh URL for the same photo, so a retry after the first URL expired still works.
 */
export interface CrewPhotoTicket<When extends Moment = string> {
  photo: CrewPhotoView<When>;
  upload: UploadTicket<When>['upload'] | null;
  /** True when the key was seen before and this is the photo it registered then. */
  replayed: boolean;
}

export interface CrewPhotosAnswer<When extends Moment = string> {
  photos: (CrewPhotoView<When> & { url: string })[];
}
