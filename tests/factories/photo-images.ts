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
    chunk('IHDR', header),
    chunk('IDAT', deflateSync(pixels)),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

/** Degrees as the three EXIF rationals: degrees, minutes, hundredths of seconds. */
function dms(value: number): Buffer {
  const abs = Math.abs(value);
  const degrees = Math.floor(abs);
  const minutes = Math.floor((abs - degrees) * 60);
  const centiSeconds = Math.round(((abs - degrees) * 60 - minutes) * 60 * 100);
  const out = Buffer.alloc(24);
  [
    [degrees, 1],
    [minutes, 1],
    [centiSeconds, 100],
  ].forEach(([n, d], i) => {
    out.writeUInt32BE(n, i * 8);
    out.writeUInt32BE(d, i * 8 + 4);
  });
  return out;
}

const u32 = (n: number) => {
  const b = Buffer.alloc(4);
  b.writeUInt32BE(n);
  return b;
};
const u16 = (n: number) => {
  const b = Buffer.alloc(2);
  b.writeUInt16BE(n);
  return b;
};

/** A TIFF block (big-endian) holding only a GPS position: the body of the EXIF a phone camera writes. */
export function gpsTiff(lat: number, lng: number): Buffer {
  const entry = (tag: number, type: number, count: number, value: Buffer) => {
    const e = Buffer.alloc(12);
    e.writeUInt16BE(tag, 0);
    e.writeUInt16BE(type, 2);
    e.writeUInt32BE(count, 4);
    value.copy(e, 8);
    return e;
  };
  const ascii = (s: string) => Buffer.from(`${s}\0\0\0`, 'latin1');
  const gpsIfdAt = 26;
  const dataAt = gpsIfdAt + 2 + 4 * 12 + 4;
  return Buffer.concat([
    Buffer.from('MM\0\x2a', 'latin1'),
    u32(8),
    Buffer.from([0, 1]),
    entry(0x8825, 4, 1, u32(gpsIfdAt)),
    u32(0),
    Buffer.from([0, 4]),
    entry(1, 2, 2, ascii(lat >= 0 ? 'N' : 'S')),
    entry(2, 5, 3, u32(dataAt)),
    entry(3, 2, 2, ascii(lng >= 0 ? 'E' : 'W')),
    entry(4, 5, 3, u32(dataAt + 24)),
    u32(0),
    dms(lat),
    dms(lng),
  ]);
}

/** Puts an EXIF block with only a GPS position into a JPEG, the way a phone camera records where it stood. */
export function withGpsExif(jpeg: Buffer, lat: number, lng: number): Buffer {
  const payload = Buffer.concat([Buffer.from('Exif\0\0', 'latin1'), gpsTiff(lat, lng)]);
  const length = Buffer.alloc(2);
  length.writeUInt16BE(payload.length + 2);
  return Buffer.concat([jpeg.subarray(0, 2), Buffer.from([0xff, 0xe1]), length, payload, jpeg.subarray(2)]);
}

/** An XMP packet carrying a position, as some phones write beside (or instead of) the EXIF. */
export function gpsXmp(lat: number, lng: number): string {
  return (
    '<x:xmpmeta xmlns:x="adobe:ns:meta/"><rdf:RDF xmlns:rdf="http://www.w3.org/1999/02/22-rdf-syntax-ns#">' +
    `<rdf:Description xmlns:exif="http://ns.adobe.com/exif/1.0/" exif:GPSLatitude="${lat}" exif:GPSLongitude="${lng}"/>` +
    '</rdf:RDF></x:xmpmeta>'
  );
}

/** Adds, after IHDR, the metadata chunks a camera or editor leaves in a PNG: eXIf with a position, text, XMP, time. */
export function withPngMetadata(png: Buffer, lat: number, lng: number): Buffer {
  const afterHeader = 8 + 12 + 13;
  const time = Buffer.from([0x07, 0xea, 11, 28, 9, 30, 0]);
  return Buffer.concat([
    png.subarray(0, afterHeader),
    chunk('eXIf', gpsTiff(lat, lng)),
    chunk('tEXt', Buffer.from('Author\0A. Neighbour', 'latin1')),
    chunk(
      'iTXt',
      Buffer.concat([Buffer.from('XML:com.adobe.xmp\0\0\0\0\0', 'latin1'), Buffer.from(gpsXmp(lat, lng), 'utf8')]),
    ),
    chunk('tIME', time),
    png.subarray(afterHeader),
  ]);
}

const box = (type: string, ...parts: Buffer[]) => {
  const body = Buffer.concat(parts);
  return Buffer.concat([u32(8 + body.length), Buffer.from(type, 'latin1'), body]);
};
const fullBox = (type: string, version: number, ...parts: Buffer[]) =>
  box(type, Buffer.from([version, 0, 0, 0]), ...parts);
const infe = (id: number, type: string, contentType?: string) =>
  fullBox(
    'infe',
    2,
    u16(id),
    u16(0),
    Buffer.from(type, 'latin1'),
    Buffer.from([0]),
    ...(contentType ? [Buffer.from(`${contentType}\0`, 'latin1')] : []),
  );

/**
 * The structure of a HEIC file as a phone writes it (ISO/IEC 23008-12): a primary image item, an EXIF item with a
 * position in the media data, and an XMP item kept in the meta box's own data (idat). The picture's bytes are a
 * stand-in (no encoder is at hand), so this tests the metadata, not the decoding.
 */
export function heicWithPosition(lat: number, lng: number) {
  const picture = Buffer.from(Array.from({ length: 96 }, (_, i) => (i * 37 + 11) % 256));
  const exif = Buffer.concat([u32(6), Buffer.from('Exif\0\0', 'latin1'), gpsTiff(lat, lng)]);
  const xmp = Buffer.from(gpsXmp(lat, lng), 'utf8');
  const ftyp = box('ftyp', Buffer.from('heic', 'latin1'), u32(0), Buffer.from('mif1heic', 'latin1'));
  const meta = (pictureAt: number, exifAt: number) =>
    fullBox(
      'meta',
      0,
      fullBox('hdlr', 0, u32(0), Buffer.from('pict', 'latin1'), Buffer.alloc(12), Buffer.from([0])),
      fullBox('pitm', 0, u16(1)),
      fullBox('iinf', 0, u16(3), infe(1, 'hvc1'), infe(2, 'Exif'), infe(3, 'mime', 'application/rdf+xml')),
      fullBox(
        'iloc',
        1,
        Buffer.from([0x44, 0x00]),
        u16(3),
        u16(1),
        u16(0),
        u16(0),
        u16(1),
        u32(pictureAt),
        u32(picture.length),
        u16(2),
        u16(0),
        u16(0),
        u16(1),
        u32(exifAt),
        u32(exif.length),
        u16(3),
        u16(1),
        u16(0),
        u16(1),
        u32(0),
        u32(xmp.length),
      ),
      box('idat', xmp),
    );
  const metaLength = meta(0, 0).length;
  const pictureAt = ftyp.length + metaLength + 8;
  const exifAt = pictureAt + picture.length;
  const file = Buffer.concat([ftyp, meta(pictureAt, exifAt), box('mdat', picture, exif)]);
  return { file, picture, pictureAt, exif, exifAt, xmp, xmpAt: file.indexOf(xmp) };
}
