import { gps } from 'exifr';
import { heifWithoutMetadata, pngWithoutMetadata } from './metadata-bytes';

/** The one thing read out of a photo's metadata: where it was taken, to offer as the site position. */
export async function readPosition(data: Blob): Promise<{ latitude: number; longitude: number } | undefined> {
  try {
    const found = await gps(data);
    return found && Number.isFinite(found.latitude) && Number.isFinite(found.longitude) ? found : undefined;
  } catch {
    return undefined;
  }
}

// Types the browser can decode and encode again. PNG and HEIC are cleaned byte by byte instead: a PNG redrawn
// can come out larger than the original, and HEIC the browser cannot encode (often not even decode).
const redrawable = new Set(['image/jpeg', 'image/webp']);
const byteCleaners: Record<string, (bytes: Uint8Array) => Uint8Array<ArrayBuffer> | null> = {
  'image/png': pngWithoutMetadata,
  'image/heic': heifWithoutMetadata,
};

/**
 * A copy of the photo that carries none of the camera's metadata (position, device, time). JPEG and WebP are drawn
 * again, applying the turn the camera recorded so the picture stays upright; PNG loses its text and EXIF chunks;
 * HEIC has its EXIF and XMP items blanked. Returns null when the photo cannot be cleaned here; the original is then
 * used.
 */
export async function withoutMetadata(data: Blob, type: string): Promise<Blob | null> {
  const cleaner = byteCleaners[type];
  if (cleaner) {
    const clean = cleaner(new Uint8Array(await data.arrayBuffer()));
    return clean ? new Blob([clean], { type }) : null;
  }
  if (!redrawable.has(type) || typeof createImageBitmap !== 'function') return null;
  try {
    const bitmap = await createImageBitmap(data, { imageOrientation: 'from-image' });
    const canvas = document.createElement('canvas');
    canvas.width = bitmap.width;
    canvas.height = bitmap.height;
    canvas.getContext('2d')?.drawImage(bitmap, 0, 0);
    bitmap.close();
    const blob = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, type, 0.92));
    return blob && blob.type === type ? blob : null;
  } catch {
    return null;
  }
}
