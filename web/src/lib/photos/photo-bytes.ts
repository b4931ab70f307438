/** Small readers for the bytes of a photo: its hash, its pixel size and when it was taken. No decoding. */

/** Hex sha256 of exactly these bytes, as the server computes it on arrival. */
export async function sha256Hex(bytes: ArrayBuffer): Promise<string> {
  const digest = await crypto.subtle.digest('SHA-256', bytes);
  return Array.from(new Uint8Array(digest), (b) => b.toString(16).padStart(2, '0')).join('');
}

const isStartOfFrame = (m: number) => m >= 0xc0 && m <= 0xcf && m !== 0xc4 && m !== 0xc8 && m !== 0xcc;

/** Width and height from a JPEG's frame header; null if the bytes are not a JPEG we can read. */
export function jpegSize(bytes: ArrayBuffer): { width: number; height: number } | null {
  const v = new DataView(bytes);
  if (v.byteLength < 4 || v.getUint16(0) !== 0xffd8) return null;
  let at = 2;
  while (at + 9 < v.byteLength) {
    if (v.getUint8(at) !== 0xff) return null;
    const marker = v.getUint8(at + 1);
    if (marker === 0xff) {
      at++;
      continue;
    }
    if (isStartOfFrame(marker)) return { height: v.getUint16(at + 5), width: v.getUint16(at + 7) };
    if (marker === 0xda || marker === 0xd9) return null;
    at += 2 + v.getUint16(at + 2);
  }
  return null;
}

const EXIF_DATE = /^(\d{4}):(\d{2}):(\d{2}) (\d{2}):(\d{2}):(\d{2})/;
const OFFSET = /^([+-])(\d{2}):(\d{2})$/;

/**
 * When the camera says the photo was taken (EXIF DateTimeOriginal, with OffsetTimeOriginal when present),
 * as ISO-8601; null when the file carries no such date. Reads only the start of the file.
 */
export function exifDateTaken(bytes: ArrayBuffer): string | null {
  try {
    const tiff = findExif(new DataView(bytes));
    if (!tiff) return null;
    const { view, start, little } = tiff;
    const u16 = (o: number) => view.getUint16(start + o, little);
    const u32 = (o: number) => view.getUint32(start + o, little);
    const ascii = (entry: number) => {
      const count = u32(entry + 4);
      const at = count <= 4 ? entry + 8 : u32(entry + 8);
      let s = '';
      for (let i = 0; i < count - 1 && start + at + i < view.byteLength; i++) s += String.fromCharCode(view.getUint8(start + at + i));
      return s;
    };
    const tags = (ifd: number) => {
      const found = new Map<number, number>();
      const n = u16(ifd);
      for (let i = 0; i < n; i++) found.set(u16(ifd + 2 + i * 12), ifd + 2 + i * 12);
      return found;
    };
    const ifd0 = tags(u32(4));
    const exifPointer = ifd0.get(0x8769);
    const exif = exifPointer !== undefined ? tags(u32(exifPointer + 8)) : new Map<number, number>();
    const dateEntry = exif.get(0x9003) ?? ifd0.get(0x0132);
    if (dateEntry === undefined) return null;
    const m = EXIF_DATE.exec(ascii(dateEntry));
    if (!m) return null;
    const [y, mo, d, h, mi, s] = m.slice(1).map(Number) as [number, number, number, number, number, number];
    const offsetEntry = exif.get(0x9011);
    const offset = offsetEntry !== undefined ? OFFSET.exec(ascii(offsetEntry)) : null;
    let time: number;
    if (offset) {
      const minutes = (Number(offset[2]) * 60 + Number(offset[3])) * (offset[1] === '-' ? -1 : 1);
      time = Date.UTC(y, mo - 1, d, h, mi, s) - minutes * 60_000;
    } else {
      // No zone recorded: the camera's clock is the phone's, so read it as local time.
      time = new Date(y, mo - 1, d, h, mi, s).getTime();
    }
    return Number.isNaN(time) ? null : new Date(time).toISOString();
  } catch {
    return null;
  }
}

function findExif(v: DataView): { view: DataView; start: number; little: boolean } | null {
  if (v.byteLength < 4 || v.getUint16(0) !== 0xffd8) return null;
  let at = 2;
  while (at + 4 < v.byteLength) {
    const marker = v.getUint16(at);
    if ((marker & 0xff00) !== 0xff00 || marker === 0xffda) return null;
    const length = v.getUint16(at + 2);
    // APP1 starting "Exif\0\0"
    if (marker === 0xffe1 && v.getUint32(at + 4) === 0x45786966 && v.getUint16(at + 8) === 0) {
      const start = at + 10;
      const order = v.getUint16(start);
      if (order !== 0x4949 && order !== 0x4d4d) return null;
      return { view: v, start, little: order === 0x4949 };
    }
    at += 2 + length;
  }
  return null;
}
