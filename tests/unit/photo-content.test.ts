import { describe, expect, it } from 'vitest';
import { photoTypeOf } from '../../server/services/photos/photo-content';
import { heicWithPosition, solidPng } from '../factories/photo-images';

const bytes = (...parts: (string | number[])[]) =>
  new Uint8Array(Buffer.concat(parts.map((p) => (typeof p === 'string' ? Buffer.from(p, 'latin1') : Buffer.from(p)))));

describe('which photo a file is, by its first bytes', () => {
  it('knows the four photo formats', () => {
    expect(photoTypeOf(new Uint8Array(solidPng(4, 4, [1, 2, 3])))).toBe('image/png');
    expect(photoTypeOf(bytes([0xff, 0xd8, 0xff, 0xe0, 0, 16], 'JFIF'))).toBe('image/jpeg');
    expect(photoTypeOf(bytes('RIFF', [0x24, 0, 0, 0], 'WEBPVP8 '))).toBe('image/webp');
    expect(photoTypeOf(new Uint8Array(heicWithPosition(44, -72).file.subarray(0, 64)))).toBe('image/heic');
  });

  it('refuses markup and other files sent under an image name', () => {
    expect(photoTypeOf(bytes('<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>'))).toBeNull();
    expect(photoTypeOf(bytes('<!doctype html><html><body>hello</body></html>'))).toBeNull();
    expect(photoTypeOf(bytes('%PDF-1.7\n'))).toBeNull();
    expect(photoTypeOf(new Uint8Array())).toBeNull();
  });

  it('takes an HEIF file only when its brands say HEVC, not AVIF', () => {
    const ftyp = (major: string, ...compatible: string[]) => {
      const size = 16 + 4 * compatible.length;
      return bytes([0, 0, 0, size], 'ftyp', major, [0, 0, 0, 0], compatible.join(''));
    };
    expect(photoTypeOf(ftyp('mif1', 'mif1', 'heic'))).toBe('image/heic');
    expect(photoTypeOf(ftyp('avif', 'mif1', 'miaf'))).toBeNull();
  });
});
