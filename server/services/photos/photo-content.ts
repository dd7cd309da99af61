import { GetObjectCommand } from '@aws-sdk/client-s3';
import { photoLeadingBytes as leadingBytes, photoTypeOf } from '@shared/requests/photo-signature';
import type { Storage } from './photos.service';

export { photoTypeOf };

/** The object's first bytes, read with a ranged GET so a 15 MB photo costs the same as a tiny one. */
export async function readLeadingBytes(store: Storage, key: string): Promise<Uint8Array> {
  const object = await store.s3.send(
    new GetObjectCommand({ Bucket: store.env.S3_BUCKET, Key: key, Range: `bytes=0-${leadingBytes - 1}` }),
  );
  return object.Body ? object.Body.transformToByteArray() : new Uint8Array();
}
