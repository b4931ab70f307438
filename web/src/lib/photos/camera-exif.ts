/**
 * The camera's EXIF block travels with the scaled photo, so the date and camera details reach the office. The pixels
 * are drawn upright on the phone, so the copy says Orientation 1: the server's auto-rotate must not turn them again.
 */

const SOI = 0xffd8;
const SOS = 0xffda;
const APP1 = 0xffe1;
const EXIF = 0x45786966; // "Exif"
const ORIENTATION = 0x0112;
const SHORT = 3;

/** The scaled JPEG with the original's EXIF (Orientation set to 1) after its start marker; unchanged if there is none. */
export function keepCameraExif(original: ArrayBuffer, scaled: ArrayBuffer): ArrayBuffer {
  const exif = uprightExif(original);
  const head = new DataView(scaled);
  if (!exif || head.byteLength < 2 || head.getUint16(0) !== SOI) return scaled;
  const out = new Uint8Array(scaled.byteLength + exif.byteLength);
  out.set(new Uint8Array(scaled, 0, 2), 0);
  out.set(exif, 2);
  out.set(new Uint8Array(scaled, 2), 2 + exif.byteLength);
  return out.buffer;
}

/** A copy of the original's APP1 Exif segment with Orientation 1, or null when there is none we can rewrite. */
export function uprightExif(original: ArrayBuffer): Uint8Array<ArrayBuffer> | null {
  try {
    const v = new DataView(original);
    if (v.byteLength < 4 || v.getUint16(0) !== SOI) return null;
    for (let at = 2; at + 4 <= v.byteLength; ) {
      const marker = v.getUint16(at);
      if ((marker & 0xff00) !== 0xff00 || marker === SOS) return null;
      const length = v.getUint16(at + 2);
      if (at + 2 + length > v.byteLength) return null;
      if (marker === APP1 && length >= 16 && v.getUint32(at + 4) === EXIF && v.getUint16(at + 8) === 0) {
        const segment = new Uint8Array(original.slice(at, at + 2 + length));
        return setUpright(new DataView(segment.buffer)) ? segment : null;
      }
      at += 2 + length;
    }
    return null;
  } catch {
    // A segment that claims more than the file holds.
    return null;
  }
}

/** Sets IFD0's Orientation to 1 in place; false when the block or the tag is not what the standard says. */
function setUpright(v: DataView): boolean {
  const tiff = 10;
  const order = v.getUint16(tiff);
  const little = order === 0x4949;
  if (!little && order !== 0x4d4d) return false;
  if (v.getUint16(tiff + 2, little) !== 42) return false;
  const ifd0 = tiff + v.getUint32(tiff + 4, little);
  const count = v.getUint16(ifd0, little);
  for (let i = 0; i < count; i++) {
    const entry = ifd0 + 2 + i * 12;
    if (v.getUint16(entry, little) !== ORIENTATION) continue;
    // One SHORT, as EXIF 2.32 defines it; a tag of another type (some editors write one) is left out with the block.
    if (v.getUint16(entry + 2, little) !== SHORT || v.getUint32(entry + 4, little) !== 1) return false;
    v.setUint16(entry + 8, 1, little);
    return true;
  }
  return true;
}
