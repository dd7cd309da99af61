/** What storage accepts for site photos; the server enforces it when it signs an upload, the client says it first. */
export const photoContentTypes = ['image/jpeg', 'image/png', 'image/webp', 'image/heic'] as const;
export type PhotoContentType = (typeof photoContentTypes)[number];
export const maxPhotoBytes = 15 * 1024 * 1024;
export const maxPhotosPerRequest = 20;
export const maxCaptionLength = 200;

/** Suggested captions: the views the office needs to judge the site before the visit. */
export const captionSuggestions = [
  'Road to the left', 'Road to the right', 'Where the entrance goes', 'The ditch', 'Towards the house',
] as const;
