/**
 * Removing camera metadata (position, device, time) from photos the browser cannot redraw without loss or at all,
 * by working on the file's own structure: PNG chunks (the PNG specification, 3rd edition) and the items of a HEIF
 * file (ISO/IEC 23008-12 on the ISO base media file format, ISO/IEC 14496-12). Both return null for a file whose
 * structure they cannot follow.
 */

// Ancillary PNG chunks that change how the picture looks; every other ancillary chunk (eXIf, tEXt, zTXt, iTXt
// where XMP lives, tIME, private ones) is left out. Critical chunks (upper-case first letter) are always kept.
const keptAncillary = new Set([
  'tRNS',
  'gAMA',
  'cHRM',
  'sRGB',
  'iCCP',
  'sBIT',
  'bKGD',
  'pHYs',
  'cICP',
  'mDCV',
  'cLLI',
  'acTL',
  'fcTL',
  'fdAT',
]);
const pngSignature = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];

const fourCc = (view: DataView, at: number) =>
  String.fromCharCode(view.getUint8(at), view.getUint8(at + 1), view.getUint8(at + 2), view.getUint8(at + 3));

export function pngWithoutMetadata(bytes: Uint8Array): Uint8Array<ArrayBuffer> | null {
  if (bytes.length < 8 || pngSignature.some((b, i) => bytes[i] !== b)) return null;
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const kept: Uint8Array[] = [bytes.subarray(0, 8)];
  let at = 8;
  let ended = false;
  while (!ended && at + 12 <= bytes.length) {
    const end = at + 12 + view.getUint32(at);
    if (end > bytes.length) return null;
    const type = fourCc(view, at + 4);
    const critical = (view.getUint8(at + 4) & 0x20) === 0;
    if (critical || keptAncillary.has(type)) kept.push(bytes.subarray(at, end));
    at = end;
    ended = type === 'IEND';
  }
  if (!ended) return null;
  const out = new Uint8Array(kept.reduce((n, part) => n + part.length, 0));
  kept.reduce((offset, part) => {
    out.set(part, offset);
    return offset + part.length;
  }, 0);
  return out;
}

interface Box {
  type: string;
  start: number;
  body: number;
  end: number;
}

/** The boxes laid one after another between `from` and `to`. */
function boxesIn(view: DataView, from: number, to: number): Box[] {
  const found: Box[] = [];
  let at = from;
  while (at + 8 <= to) {
    let size = view.getUint32(at);
    let header = 8;
    if (size === 1) {
      if (at + 16 > to) throw new RangeError('truncated box');
      size = Number(view.getBigUint64(at + 8));
      header = 16;
    } else if (size === 0) {
      size = to - at;
    }
    if (size < header || at + size > to) throw new RangeError('box overruns its parent');
    found.push({ type: fourCc(view, at + 4), start: at, body: at + header, end: at + size });
    at += size;
  }
  return found;
}

function cString(view: DataView, at: number, end: number): [string, number] {
  let text = '';
  while (at < end && view.getUint8(at) !== 0) text += String.fromCharCode(view.getUint8(at++));
  return [text, at + 1];
}

/** Item ids whose content is metadata: EXIF, and XMP (a 'mime' item of type application/rdf+xml). */
function metadataItemIds(view: DataView, iinf: Box): Set<number> {
  const version = view.getUint8(iinf.body);
  const ids = new Set<number>();
  for (const infe of boxesIn(view, iinf.body + (version === 0 ? 6 : 8), iinf.end)) {
    if (infe.type !== 'infe') continue;
    const infeVersion = view.getUint8(infe.body);
    let at = infe.body + 4;
    const id = infeVersion === 3 ? view.getUint32(at) : view.getUint16(at);
    at += (infeVersion === 3 ? 4 : 2) + 2;
    let itemType = 'mime';
    if (infeVersion >= 2) {
      itemType = fourCc(view, at);
      at += 4;
    }
    const [, afterName] = cString(view, at, infe.end);
    const [contentType] = itemType === 'mime' ? cString(view, afterName, infe.end) : [''];
    if (itemType === 'Exif' || (itemType === 'mime' && contentType === 'application/rdf+xml')) ids.add(id);
  }
  return ids;
}

function readSized(view: DataView, at: number, size: number): number {
  if (size === 0) return 0;
  if (size === 4) return view.getUint32(at);
  if (size === 8) return Number(view.getBigUint64(at));
  throw new RangeError(`unsupported field size ${size}`);
}

/** The byte ranges (in the file) holding the given items, from the item location box. */
function itemRanges(view: DataView, iloc: Box, ids: Set<number>, idat: Box | undefined): [number, number][] {
  const version = view.getUint8(iloc.body);
  let at = iloc.body + 4;
  const offsetSize = view.getUint8(at) >> 4;
  const lengthSize = view.getUint8(at) & 0xf;
  const baseOffsetSize = view.getUint8(at + 1) >> 4;
  const indexSize = version === 1 || version === 2 ? view.getUint8(at + 1) & 0xf : 0;
  at += 2;
  const count = version < 2 ? view.getUint16(at) : view.getUint32(at);
  at += version < 2 ? 2 : 4;
  const ranges: [number, number][] = [];
  for (let item = 0; item < count; item += 1) {
    const id = version < 2 ? view.getUint16(at) : view.getUint32(at);
    at += version < 2 ? 2 : 4;
    let method = 0;
    if (version === 1 || version === 2) {
      method = view.getUint16(at) & 0xf;
      at += 2;
    }
    const dataReference = view.getUint16(at);
    const baseOffset = readSized(view, at + 2, baseOffsetSize);
    at += 2 + baseOffsetSize;
    const extents = view.getUint16(at);
    at += 2;
    for (let e = 0; e < extents; e += 1) {
      at += indexSize;
      const offset = readSized(view, at, offsetSize);
      const length = readSized(view, at + offsetSize, lengthSize);
      at += offsetSize + lengthSize;
      if (!ids.has(id)) continue;
      if (dataReference !== 0 || length === 0 || method > 1 || (method === 1 && !idat))
        throw new RangeError('item stored where it cannot be blanked');
      const from = (method === 1 ? idat!.body : 0) + baseOffset + offset;
      ranges.push([from, from + length]);
    }
  }
  return ranges;
}

/**
 * A copy of a HEIF/HEIC file with the bytes of its EXIF and XMP items set to zero. The file keeps its length and
 * structure, so every offset in it stays true and the picture decodes as before (its turn is a HEIF property, not
 * an EXIF tag).
 */
export function heifWithoutMetadata(bytes: Uint8Array): Uint8Array<ArrayBuffer> | null {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  try {
    const top = boxesIn(view, 0, bytes.length);
    const meta = top.find((b) => b.type === 'meta');
    if (top[0]?.type !== 'ftyp' || !meta) return null;
    const inside = boxesIn(view, meta.body + 4, meta.end);
    const iinf = inside.find((b) => b.type === 'iinf');
    const iloc = inside.find((b) => b.type === 'iloc');
    if (!iinf || !iloc) return null;
    const ids = metadataItemIds(view, iinf);
    const ranges = itemRanges(
      view,
      iloc,
      ids,
      inside.find((b) => b.type === 'idat'),
    );
    if (ranges.some(([, to]) => to > bytes.length)) return null;
    const out = new Uint8Array(bytes); // a copy, also when given a Node Buffer (whose slice is a view)
    for (const [from, to] of ranges) out.fill(0, from, to);
    return out;
  } catch (error) {
    if (error instanceof RangeError) return null;
    throw error;
  }
}
