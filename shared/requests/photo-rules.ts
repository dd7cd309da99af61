import { z } from 'zod';

/** What the storage accepts for site photos; the browser checks first, the server decides. */
export const photoContentTypes = ['image/jpeg', 'image/png', 'image/webp', 'image/heic'] as const;
export const photoExtensions: Record<(typeof photoContentTypes)[number], string> = {
  'image/jpeg': 'jpg', 'image/png': 'png', 'image/webp': 'webp', 'image/heic': 'heic',
};
export const maxPhotoBytes = 15 * 1024 * 1024;
export const maxPhotosPerRequest = 20;

/** Suggested captions: the views the office needs to judge an entrance from the desk. */
export const captionSuggestions = [
  'Looking along the road to the left',
  'Looking along the road to the right',
  'The ditch where the entrance goes',
  'Where the entrance goes, from the road',
  'Towards the house from the road',
  'The existing culvert',
];

export const photoCaptionSchema = z.string({ error: 'Must be text.' }).trim().max(200, 'Keep captions under 200 characters.');

export const photoUploadInputSchema = z.strictObject({
  fileName: z.string({ error: 'This is required.' }).trim().min(1, 'The file needs a name.').max(200, 'Keep file names under 200 characters.'),
  contentType: z.enum(photoContentTypes, { error: 'Photos must be JPEG, PNG, WebP or HEIC images.' }),
  sizeBytes: z.number({ error: 'Must be the file size in bytes.' }).int('Must be a whole number of bytes.')
    .min(1, 'The file is empty.').max(maxPhotoBytes, 'Photos may be at most 15 MB each.'),
});

export const photoConfirmInputSchema = z.strictObject({
  caption: photoCaptionSchema.optional(),
  gpsLat: z.number({ error: 'Must be a number.' }).min(-90, 'Latitude is between -90 and 90.').max(90, 'Latitude is between -90 and 90.').nullable().optional(),
  gpsLng: z.number({ error: 'Must be a number.' }).min(-180, 'Longitude is between -180 and 180.').max(180, 'Longitude is between -180 and 180.').nullable().optional(),
});

export const photoCaptionInputSchema = z.strictObject({ caption: photoCaptionSchema });
