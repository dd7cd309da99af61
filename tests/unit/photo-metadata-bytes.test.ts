import { gps } from 'exifr';
import { inflateSync } from 'node:zlib';
import { describe, expect, it } from 'vitest';
import { heifWithoutMetadata, pngWithoutMetadata } from '../../src/features/photos/components/metadata-bytes';
import { gpsTiff, gpsXmp, heicWithPosition, solidPng, withPngMetadata } from '../factories/photo-images';

// A made-up site position (demo scenario); exifr is the same reader the browser uses to offer it as the site.
const lat = 44.26012;
const lng = -72.57541;
const positionIn = (bytes: Uint8Array) => gps(Buffer.from(bytes)).catch(() => undefined);

function pngChunks(png: Uint8Array) {
  const buffer = Buffer.from(png);
  const chunks: { type: string; data: Buffer }[] = [];
  for (let at = 8; at < buffer.length;) {
    const length = buffer.readUInt32BE(at);
    chunks.push({ type: buffer.toString('latin1', at + 4, at + 8), data: buffer.subarray(at + 8, at + 8 + length) });
    at += 12 + length;
  }
  return chunks;
}

describe('PNG photos lose their metadata chunks (PNG specification: ancillary chunks)', () => {
  const plain = solidPng(8, 6, [120, 140, 90]);
  const tagged = withPngMetadata(plain, lat, lng);

  it('keeps the picture and drops eXIf, tEXt, iTXt (XMP) and tIME', async () => {
    expect((await positionIn(tagged))?.latitude).toBeCloseTo(lat, 4);
    expect(pngChunks(tagged).map((c) => c.type)).toEqual(['IHDR', 'eXIf', 'tEXt', 'iTXt', 'tIME', 'IDAT', 'IEND']);

    const clean = pngWithoutMetadata(tagged)!;
    expect(pngChunks(clean).map((c) => c.type)).toEqual(['IHDR', 'IDAT', 'IEND']);
    expect(Buffer.from(clean).equals(plain)).toBe(true);
    expect(inflateSync(pngChunks(clean)[1].data).equals(inflateSync(pngChunks(plain)[1].data))).toBe(true);
    expect(await positionIn(clean)).toBeUndefined();
  });

  it('keeps the chunks that change how the picture looks', () => {
    const srgb = Buffer.concat([
      Buffer.from([0, 0, 0, 1]),
      Buffer.from('sRGB', 'latin1'),
      Buffer.from([0]),
      Buffer.from([0xae, 0xce, 0x1c, 0xe9]),
    ]);
    const withColour = Buffer.concat([tagged.subarray(0, 33), srgb, tagged.subarray(33)]);
    expect(pngChunks(pngWithoutMetadata(withColour)!).map((c) => c.type)).toEqual(['IHDR', 'sRGB', 'IDAT', 'IEND']);
  });

  it('refuses what is not a whole PNG', () => {
    expect(pngWithoutMetadata(Buffer.from('not a picture at all'))).toBeNull();
    expect(pngWithoutMetadata(tagged.subarray(0, tagged.length - 12))).toBeNull();
    expect(pngWithoutMetadata(tagged.subarray(0, 40))).toBeNull();
  });
});

describe('HEIC photos have their EXIF and XMP items blanked (ISO/IEC 23008-12 items, ISO/IEC 14496-12 iloc)', () => {
  const { file, picture, pictureAt, exif, exifAt, xmp, xmpAt } = heicWithPosition(lat, lng);

  it('blanks the position in place and leaves the picture and the structure as they were', async () => {
    expect((await positionIn(file))?.longitude).toBeCloseTo(lng, 4);

    const clean = heifWithoutMetadata(file)!;
    expect(clean.length).toBe(file.length);
    expect(await positionIn(clean)).toBeUndefined();
    const cleanBuffer = Buffer.from(clean);
    expect(cleanBuffer.includes(gpsTiff(lat, lng))).toBe(false);
    expect(cleanBuffer.includes(Buffer.from(gpsXmp(lat, lng)))).toBe(false);
    expect(cleanBuffer.subarray(pictureAt, pictureAt + picture.length).equals(picture)).toBe(true);
    // The two items' bytes are all zero now, and no other byte changed.
    expect(cleanBuffer.subarray(exifAt, exifAt + exif.length).equals(Buffer.alloc(exif.length))).toBe(true);
    expect(cleanBuffer.subarray(xmpAt, xmpAt + xmp.length).equals(Buffer.alloc(xmp.length))).toBe(true);
    const inItem = (i: number) => (i >= exifAt && i < exifAt + exif.length) || (i >= xmpAt && i < xmpAt + xmp.length);
    expect([...file].every((byte, i) => inItem(i) || clean[i] === byte)).toBe(true);
  });

  it('refuses what is not a HEIF file or is cut short', () => {
    expect(heifWithoutMetadata(solidPng(2, 2, [0, 0, 0]))).toBeNull();
    expect(heifWithoutMetadata(file.subarray(0, 60))).toBeNull();
    expect(heifWithoutMetadata(file.subarray(0, file.length - 20))).toBeNull();
  });
});
