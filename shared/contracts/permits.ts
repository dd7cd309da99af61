import { z } from 'zod';
import { packetPaperSizes } from '../workflow/transition-inputs';
import type { Moment } from './wire';

/** GET /api/requests/:id/permit-packet?paper=a4: the packet as it would be filed now. */
export const packetQuerySchema = z.object({
  paper: z.enum(packetPaperSizes, { error: 'Paper size must be letter or a4.' }).default('letter'),
});

/** What the road authority's decision letter may be: a PDF, or a photo of the paper letter. */
export const letterContentTypes = ['application/pdf', 'image/jpeg', 'image/png', 'image/webp', 'image/heic'] as const;
export type LetterContentType = (typeof letterContentTypes)[number];
export const letterExtensions: Record<LetterContentType, string> = {
  'application/pdf': 'pdf',
  'image/jpeg': 'jpg',
  'image/png': 'png',
  'image/webp': 'webp',
  'image/heic': 'heic',
};
export const maxLetterBytes = 20 * 1024 * 1024;

const letterFile = {
  fileName: z
    .string({ error: 'This is required.' })
    .trim()
    .min(1, 'The file needs a name.')
    .max(200, 'Keep file names under 200 characters.'),
  contentType: z.enum(letterContentTypes, { error: 'The letter must be a PDF, or a JPEG, PNG, WebP or HEIC photo.' }),
  sizeBytes: z
    .number({ error: 'Must be the file size in bytes.' })
    .int('Must be a whole number of bytes.')
    .min(1, 'The file is empty.')
    .max(maxLetterBytes, 'The letter may be at most 20 MB.'),
};

/** POST /api/requests/:id/decision-letters: the file about to be uploaded straight to storage. */
export const letterUploadInputSchema = z.strictObject(letterFile);
export type LetterUploadInput = z.input<typeof letterUploadInputSchema>;

/** POST /api/requests/:id/decision-letters/confirm, once the bytes are in storage. */
export const letterConfirmInputSchema = z.strictObject({
  uploadId: z.uuid('must be the upload id the server gave'),
  ...letterFile,
});
export type LetterConfirmInput = z.input<typeof letterConfirmInputSchema>;

export interface LetterUploadAnswer {
  uploadId: string;
  upload: { method: 'PUT'; url: string; headers: Record<string, string>; expiresInSeconds: number };
}

/** A document of the request as the office reads it (the packet filed, the letter). */
export interface PermitDocumentView<When extends Moment = string> {
  id: string;
  kind: string;
  title: string;
  contentType: string;
  sizeBytes: number;
  createdAt: When;
}

export interface LetterConfirmAnswer<When extends Moment = string> {
  document: PermitDocumentView<When>;
}
