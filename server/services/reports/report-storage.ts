import { GetObjectCommand, PutObjectCommand } from '@aws-sdk/client-s3';
import { getSignedUrl } from '@aws-sdk/s3-request-presigner';
import type { AppContext } from '../../config/context';

/** Long enough to open or save the file, short enough that a forwarded link soon stops working. */
export const DOWNLOAD_SECONDS = 300;

export async function storeReport(ctx: Pick<AppContext, 's3' | 'env'>, key: string, body: Buffer) {
  await ctx.s3.send(
    new PutObjectCommand({ Bucket: ctx.env.S3_BUCKET, Key: key, Body: body, ContentType: 'application/pdf' }),
  );
}

const extensions: Record<string, string> = {
  'application/pdf': 'pdf',
  'image/jpeg': 'jpg',
  'image/png': 'png',
  'image/webp': 'webp',
  'image/heic': 'heic',
};

export function downloadUrl(
  ctx: Pick<AppContext, 's3' | 'env'>,
  doc: { objectKey: string; title: string; contentType: string },
) {
  const extension = extensions[doc.contentType] ?? 'pdf';
  const fileName = `${doc.title.replace(/[^\w.-]+/g, '-')}.${extension}`;
  return getSignedUrl(
    ctx.s3,
    new GetObjectCommand({
      Bucket: ctx.env.S3_BUCKET,
      Key: doc.objectKey,
      ResponseContentType: doc.contentType,
      ResponseContentDisposition: `inline; filename="${fileName}"`,
    }),
    { expiresIn: DOWNLOAD_SECONDS },
  );
}
