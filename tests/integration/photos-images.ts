import { crc32, deflateSync } from 'node:zlib';

function chunk(type: string, data: Buffer) {
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([length, body, crc]);
}

/** A real, decodable PNG of one flat colour, built byte by byte so tests need no image files on disk. */
export function solidPng(width: number, height: number, [r, g, b]: [number, number, number]): Buffer {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header.set([8, 2, 0, 0, 0], 8); // 8-bit RGB, no interlace
  const row = Buffer.alloc(1 + width * 3);
  for (let x = 0; x < width; x += 1) row.set([r, g, b], 1 + x * 3);
  const pixels = Buffer.concat(Array.from({ length: height }, () => row));
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', header), chunk('IDAT', deflateSync(pixels)), chunk('IEND', Buffer.alloc(0)),
  ]);
}

/** Degrees as the three EXIF rationals: degrees, minutes, hundredths of seconds. */
function dms(value: number): Buffer {
  const abs = Math.abs(value);
  const degrees = Math.floor(abs);
  const minutes = Math.floor((abs - degrees) * 60);
  const centiSeconds = Math.round(((abs - degrees) * 60 - minutes) * 60 * 100);
  const out = Buffer.alloc(24);
  [[degrees, 1], [minutes, 1], [centiSeconds, 100]].forEach(([n, d], i) => { out.writeUInt32BE(n, i * 8); out.writeUInt32BE(d, i * 8 + 4); });
  return out;
}

/** Puts an EXIF block with only a GPS position into a JPEG, the way a phone camera records where it stood. */
export function withGpsExif(jpeg: Buffer, lat: number, lng: number): Buffer {
  const entry = (tag: number, type: number, count: number, value: Buffer) => {
    const e = Buffer.alloc(12);
    e.writeUInt16BE(tag, 0); e.writeUInt16BE(type, 2); e.writeUInt32BE(count, 4); value.copy(e, 8);
    return e;
  };
  const u32 = (n: number) => { const b = Buffer.alloc(4); b.writeUInt32BE(n); return b; };
  const ascii = (s: string) => Buffer.from(`${s}\0\0\0`, 'latin1');
  const gpsIfdAt = 26;
  const dataAt = gpsIfdAt + 2 + 4 * 12 + 4;
  const tiff = Buffer.concat([
    Buffer.from('MM\0\x2a', 'latin1'), u32(8),
    Buffer.from([0, 1]), entry(0x8825, 4, 1, u32(gpsIfdAt)), u32(0),
    Buffer.from([0, 4]),
    entry(1, 2, 2, ascii(lat >= 0 ? 'N' : 'S')), entry(2, 5, 3, u32(dataAt)),
    entry(3, 2, 2, ascii(lng >= 0 ? 'E' : 'W')), entry(4, 5, 3, u32(dataAt + 24)), u32(0),
    dms(lat), dms(lng),
  ]);
  const payload = Buffer.concat([Buffer.from('Exif\0\0', 'latin1'), tiff]);
  const length = Buffer.alloc(2);
  length.writeUInt16BE(payload.length + 2);
  return Buffer.concat([jpeg.subarray(0, 2), Buffer.from([0xff, 0xe1]), length, payload, jpeg.subarray(2)]);
}
