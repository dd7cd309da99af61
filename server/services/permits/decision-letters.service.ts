import { DeleteObjectCommand, GetObjectCommand, HeadObjectCommand, PutObjectCommand } from '@aws-sdk/client-s3';
import { getSignedUrl } from '@aws-sdk/s3-request-presigner';
import { randomUUID } from 'node:crypto';
import { letterExtensions, type LetterContentType } from '@shared/contracts/permits';
import type { AppContext } from '../../config/context';
import { documents, requestEvents } from '../../db/schema';
import { badRequest, conflict } from '../../lib/errors';
import type { SessionUser } from '../../lib/session-user';
import { photoTypeOf } from '../photos/photo-content';
import { loadVisibleRequest, type RequestRow } from '../requests/request-access';

export const LETTER_KIND = 'decision-letter';
const uploadSeconds = 300;
type LetterContext = Pick<AppContext, 'db' | 's3' | 'env'>;
interface LetterFile {
  fileName: string;
  contentType: LetterContentType;
  sizeBytes: number;
}

/** Which letter format a file's first bytes are: a PDF by its header, a photo by its signature; null otherwise. */
export function letterTypeOf(bytes: Uint8Array): LetterContentType | null {
  // A PDF starts with "%PDF-" (ISO 32000-1, 7.5.2), give or take a few bytes of junk some writers put first.
  const head = String.fromCharCode(...bytes.subarray(0, Math.min(bytes.length, 1024)));
  if (head.indexOf('%PDF-') >= 0 && head.indexOf('%PDF-') < 16) return 'application/pdf';
  return photoTypeOf(bytes);
}

/** The letter answers the application, so it comes once the permit is filed; the office alone adds it. */
async function loadFiled(ctx: LetterContext, user: SessionUser, requestId: string) {
  const row = await loadVisibleRequest(ctx.db, user, requestId);
  if (!row.permitReference)
    throw conflict('Record the permit filing first; the road authority’s letter is added after it.');
  return row;
}

const keyFor = (row: RequestRow, uploadId: string, contentType: LetterContentType) =>
  `requests/${row.id}/decision-letters/${uploadId}.${letterExtensions[contentType]}`;

/** A presigned PUT for the letter: the bytes go straight to storage, signed to exactly this type. */
export async function presignLetter(ctx: LetterContext, user: SessionUser, requestId: string, file: LetterFile) {
  const row = await loadFiled(ctx, user, requestId);
  const uploadId = randomUUID();
  const url = await getSignedUrl(
    ctx.s3,
    new PutObjectCommand({
      Bucket: ctx.env.S3_BUCKET,
      Key: keyFor(row, uploadId, file.contentType),
      ContentType: file.contentType,
      ContentLength: file.sizeBytes,
    }),
    { expiresIn: uploadSeconds, signableHeaders: new Set(['content-type']) },
  );
  return {
    uploadId,
    upload: {
      method: 'PUT' as const,
      url,
      headers: { 'content-type': file.contentType },
      expiresInSeconds: uploadSeconds,
    },
  };
}

const leadingBytes = 1024;

/**
 * Lists the letter once storage holds exactly the announced file and its first bytes say it is a PDF or a photo of
 * the announced kind, whatever it was called. Anything else is deleted from storage and refused.
 */
export async function confirmLetter(
  ctx: LetterContext,
  user: SessionUser,
  requestId: string,
  file: LetterFile & { uploadId: string },
) {
  const row = await loadFiled(ctx, user, requestId);
  const objectKey = keyFor(row, file.uploadId, file.contentType);
  const head = await ctx.s3
    .send(new HeadObjectCommand({ Bucket: ctx.env.S3_BUCKET, Key: objectKey }))
    .catch((error: { name?: string }) => {
      if (error.name === 'NotFound' || error.name === 'NoSuchKey') return null;
      throw error;
    });
  if (!head) throw conflict('The letter has not reached storage. Upload it again.');
  if (head.ContentLength !== file.sizeBytes || head.ContentType !== file.contentType)
    throw conflict('The stored file is not the one that was announced. Upload it again.');
  const object = await ctx.s3.send(
    new GetObjectCommand({ Bucket: ctx.env.S3_BUCKET, Key: objectKey, Range: `bytes=0-${leadingBytes - 1}` }),
  );
  const bytes = object.Body ? await object.Body.transformToByteArray() : new Uint8Array();
  if (letterTypeOf(bytes) !== file.contentType) {
    await ctx.s3.send(new DeleteObjectCommand({ Bucket: ctx.env.S3_BUCKET, Key: objectKey }));
    throw badRequest(
      `"${file.fileName}" is not a PDF or a JPEG, PNG, WebP or HEIC photo of the kind it says, so it was not added. Choose the letter's PDF or a photo of it.`,
      { fileName: 'is not a PDF or a photo' },
    );
  }
  return ctx.db.transaction(async (tx) => {
    const [document] = await tx
      .insert(documents)
      .values({
        requestId: row.id,
        kind: LETTER_KIND,
        title: `Road authority letter: ${file.fileName}`,
        objectKey,
        contentType: file.contentType,
        sizeBytes: file.sizeBytes,
        createdById: user.id,
      })
      .onConflictDoNothing({ target: documents.objectKey })
      .returning();
    if (!document) throw conflict('This letter was already added.');
    await tx.insert(requestEvents).values({
      requestId: row.id,
      actorId: user.id,
      kind: LETTER_KIND,
      internal: true,
      documentId: document.id,
      note: `The road authority’s letter added (${file.fileName}).`,
    });
    return document;
  });
}
