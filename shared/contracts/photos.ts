import { z } from 'zod';
import type { RequestStatus } from '../workflow/statuses';
import { maxPhotoBytes, photoCaptionSchema, photoContentTypes } from '../requests/photo-rules';
import type { Moment } from './wire';

/** Photos can change until the site visit has happened: after that the office works from what it saw. */
export const photoEditableStatuses: readonly RequestStatus[] = ['draft', 'submitted', 'needs_details', 'visit_booked'];
export const photosEditable = (status: RequestStatus) => photoEditableStatuses.includes(status);

/** POST /api/requests/:id/photos: the file about to be uploaded. */
export const photoUploadInputSchema = z.strictObject({
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
});
export type PhotoUploadInput = z.input<typeof photoUploadInputSchema>;

/** POST /api/requests/:id/photos/:photoId/confirm, once the bytes are in storage. */
export const photoConfirmInputSchema = z.strictObject({
  caption: photoCaptionSchema.optional(),
  gpsLat: z
    .number({ error: 'Must be a number.' })
    .min(-90, 'Latitude is between -90 and 90.')
    .max(90, 'Latitude is between -90 and 90.')
    .nullable()
    .optional(),
  gpsLng: z
    .number({ error: 'Must be a number.' })
    .min(-180, 'Longitude is between -180 and 180.')
    .max(180, 'Longitude is between -180 and 180.')
    .nullable()
    .optional(),
});
export type PhotoConfirmInput = z.input<typeof photoConfirmInputSchema>;

/** PATCH /api/requests/:id/photos/:photoId. */
export const photoCaptionInputSchema = z.strictObject({ caption: photoCaptionSchema });

/** A photo as its readers see it: never the storage key, never anything read from the file itself. */
export interface PhotoView<When extends Moment = string> {
  id: string;
  fileName: string;
  contentType: string;
  sizeBytes: number;
  caption: string;
  gpsLat: number | null;
  gpsLng: number | null;
  createdAt: When;
  storedAt: When | null;
  /** A short-lived link to the bytes, on lists and after confirming. */
  url?: string;
  urlExpiresInSeconds?: number;
}

export interface PhotosAnswer<When extends Moment = string> {
  photos: (PhotoView<When> & { url: string })[];
}
export interface PhotoLinkAnswer {
  url: string;
  expiresInSeconds: number;
}
export interface UploadTicket<When extends Moment = string> {
  photo: PhotoView<When>;
  upload: { method: 'PUT'; url: string; headers: Record<string, string>; expiresInSeconds: number };
}
