import { z } from 'zod';

/** What the storage accepts for site photos; the browser checks first, the server decides. */
export const photoContentTypes = ['image/jpeg', 'image/png', 'image/webp', 'image/heic'] as const;
export const photoExtensions: Record<(typeof photoContentTypes)[number], string> = {
  'image/jpeg': 'jpg',
  'image/png': 'png',
  'image/webp': 'webp',
  'image/heic': 'heic',
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

export const photoCaptionSchema = z
  .string({ error: 'Must be text.' })
  .trim()
  .max(200, 'Keep captions under 200 characters.');
