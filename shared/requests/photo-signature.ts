import type { photoContentTypes } from './photo-rules';

export type PhotoType = (typeof photoContentTypes)[number];

/** Enough for every signature below, including an ftyp box with a few compatible brands. */
export const photoLeadingBytes = 64;

const ascii = (bytes: Uint8Array, from: number, to: number) => String.fromCharCode(...bytes.subarray(from, to));
const pngSignature = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
/** HEVC-coded HEIF brands (ISO/IEC 23008-12, from memory). mif1 alone would also admit AVIF and other codecs. */
const heicBrands = new Set(['heic', 'heix', 'heim', 'heis', 'hevc', 'hevx', 'hevm', 'hevs']);

/**
 * Which photo format the file's first bytes are, by its signature; null for anything else (SVG, HTML, text...).
 * The browser asks before an upload and the server again once the bytes are stored: a file's name proves nothing.
 */
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

/**
 * Why a chosen file cannot be a site photo, in words for the person who chose it; null when it can. Decided by
 * its size and first bytes, never by its name.
 */
export function photoRefusal(name: string, size: number, leading: Uint8Array, maxBytes: number): string | null {
  if (size === 0) return `“${name}” is empty (0 bytes), so there is no photo in it. Choose the photo file itself.`;
  if (size > maxBytes)
    return `“${name}” is larger than ${Math.round(maxBytes / 1024 / 1024)} MB. Choose a smaller photo, or send it from your phone at a lower size.`;
  if (!photoTypeOf(leading))
    return `“${name}” is not a photo: its contents are not a JPEG, PNG, WebP or HEIC image, whatever its name says. It was not added.`;
  return null;
}
