import { describe, expect, it } from 'vitest';
import { keepCameraExif, uprightExif } from './camera-exif';
import { exifDateTaken, jpegSize } from './photo-bytes';
import { fakeJpeg } from './test-photos';

const buffer = (u: Uint8Array) => u.buffer.slice(u.byteOffset, u.byteOffset + u.byteLength) as ArrayBuffer;

/**
 * A camera's APP1 block, little-endian as most phones write it: IFD0 with Orientation (SHORT, or another type when
 * asked) and DateTime (ASCII, 20 bytes). Tag numbers and types from EXIF 2.32 (CIPA DC-008-2019), 4.6.4 table 4.
 */
function cameraFile(orientation: number, type = 3): Uint8Array {
  const tiff: number[] = [0x49, 0x49, 0x2a, 0x00, 8, 0, 0, 0];
  const u16 = (n: number) => [n & 0xff, n >> 8];
  const u32 = (n: number) => [n & 0xff, (n >> 8) & 0xff, (n >> 16) & 0xff, (n >>> 24) & 0xff];
  // IFD0 at 8: two entries, next 0; 2 + 24 + 4 = 30, so the date's text starts at 38.
  tiff.push(...u16(2), ...u16(0x0112), ...u16(type), ...u32(1), ...u16(orientation), 0, 0);
  tiff.push(...u16(0x0132), ...u16(2), ...u32(20), ...u32(38), ...u32(0));
  for (const ch of '2026:03:14 09:12:30\0') tiff.push(ch.charCodeAt(0));
  const body = [0x45, 0x78, 0x69, 0x66, 0, 0, ...tiff];
  const scaled = fakeJpeg({ width: 4000, height: 3000, bytes: 600 });
  return new Uint8Array([0xff, 0xd8, 0xff, 0xe1, (body.length + 2) >> 8, (body.length + 2) & 0xff, ...body, ...scaled.slice(2)]);
}

describe('the camera’s EXIF on the scaled photo', () => {
  it('is copied with Orientation 1, since the pixels were drawn upright', () => {
    const original = buffer(cameraFile(6));
    const scaled = buffer(fakeJpeg({ width: 2560, height: 1920, bytes: 900, seed: 4 }));
    const kept = keepCameraExif(original, scaled);
    expect(kept.byteLength).toBeGreaterThan(scaled.byteLength);
    // Still a JPEG of the scaled size, now carrying the camera's date.
    expect(jpegSize(kept)).toEqual({ width: 2560, height: 1920 });
    expect(exifDateTaken(kept)).toBe(new Date(2026, 2, 14, 9, 12, 30).toISOString());
    const exif = uprightExif(kept)!;
    // Orientation's value sits 8 bytes into its entry: APP1 header 10, TIFF header 8, count 2.
    expect(new DataView(exif.buffer).getUint16(10 + 8 + 2 + 8, true)).toBe(1);
    // The original is left as it was.
    expect(new DataView(original).getUint16(2 + 4 + 6 + 8 + 2 + 8, true)).toBe(6);
  });

  it('is left out when the Orientation tag is not one SHORT, and when there is no EXIF at all', () => {
    const scaled = buffer(fakeJpeg({ width: 2560, height: 1920, bytes: 900 }));
    expect(keepCameraExif(buffer(cameraFile(6, 4)), scaled)).toBe(scaled);
    expect(keepCameraExif(buffer(fakeJpeg({ width: 10, height: 10 })), scaled)).toBe(scaled);
    expect(keepCameraExif(new Uint8Array([1, 2, 3]).buffer, scaled)).toBe(scaled);
  });

  it('refuses a segment that claims more than the file holds', () => {
    const file = cameraFile(3);
    expect(uprightExif(buffer(file.slice(0, 40)))).toBeNull();
  });
});
