import { gps } from 'exifr';

/** The one thing read out of a photo's metadata: where it was taken, to offer as the site position. */
export async function readPosition(data: Blob): Promise<{ latitude: number; longitude: number } | undefined> {
  try {
    const found = await gps(data);
    return found && Number.isFinite(found.latitude) && Number.isFinite(found.longitude) ? found : undefined;
  } catch {
    return undefined;
  }
}

// Types the browser can both decode and encode again; HEIC it cannot, so those go up as they are.
const redrawable = new Set(['image/jpeg', 'image/webp']);

/**
 * Draws the photo again so the copy that leaves the browser carries none of the camera's metadata (position,
 * device, time). The turn the camera recorded is applied while drawing, so the picture stays upright.
 * Returns null when the photo cannot be redrawn here; the original is then used.
 */
export async function withoutMetadata(data: Blob, type: string): Promise<Blob | null> {
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
