import { GetObjectCommand } from '@aws-sdk/client-s3';
import type { photoContentTypes } from '@shared/requests/photo-rules';
import type { Storage } from './photos.service';

type PhotoType = (typeof photoContentTypes)[number];

/** Enough for every signature below, including an ftyp box with a few compatible brands. */
const leadingBytes = 64;

const ascii = (bytes: Uint8Array, from: number, to: number) => String.fromCharCode(...bytes.subarray(from, to));
const pngSignature = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
/** HEVC-coded HEIF brands (ISO/IEC 23008-12, from memory). mif1 alone would also admit AVIF and other codecs. */
const heicBrands = new Set(['heic', 'heix', 'heim', 'heis', 'hevc', 'hevx', 'hevm', 'hevs']);

/** Which photo format the file's first bytes are, by its signature; null for anything else (SVG, HTML, text...). */
export function photoTypeOf(bytes: Uint8Array): PhotoType | null {
  if (bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff) return 'image/jpeg';
  if (pngSignature.every((b, i) => bytes[i] === b)) return 'image/png';
  if (ascii(bytes, 0, 4) === 'RIFF' && ascii(bytes, 8, 12) === 'WEBP') return 'image/webp';
  if (bytes.length >= 16 && ascii(bytes, 4, 8) === 'ftyp') {
    const boxEnd = Math.min(new DataView(bytes.buffer, bytes.byteOffset).getUint32(0), bytes.length);
    const brands = [ascii(bytes, 8, 12)];
    for (let at = 16; at + 4 <= boxEnd; at += 4) brands.push(ascii(bytes, at, at + 4));
    if (brands.some((b) => heicBrands.has(b))) return 'image/heic';
  }
  return null;
}

/** The object's first bytes, read with a ranged GET so a 15 MB photo costs the same as a tiny one. */
export async function readLeadingBytes(store: Storage, key: string): Promise<Uint8Array> {
  const object = await store.s3.send(
    new GetObjectCommand({ Bucket: store.env.S3_BUCKET, Key: key, Range: `bytes=0-${leadingBytes - 1}` }),
  );
  return object.Body ? object.Body.transformToByteArray() : new Uint8Array();
}
