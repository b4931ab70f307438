/** Photo bytes for tests: a JPEG frame header (so its size can be read), an optional EXIF date, and filler. */
export function fakeJpeg({ width, height, bytes = 2048, seed = 1, taken }: { width: number; height: number; bytes?: number; seed?: number; taken?: string }): Uint8Array<ArrayBuffer> {
  const parts: number[] = [0xff, 0xd8];
  if (taken) parts.push(...exifSegment(taken));
  parts.push(0xff, 0xc0, 0x00, 0x11, 0x08, height >> 8, height & 0xff, width >> 8, width & 0xff, 0x03, 1, 0x22, 0, 2, 0x11, 1, 3, 0x11, 1);
  parts.push(0xff, 0xda, 0x00, 0x08, 0x01, 0x01, 0x00, 0x00, 0x3f, 0x00);
  const out = new Uint8Array(Math.max(bytes, parts.length + 2));
  out.set(parts);
  let x = seed;
  for (let i = parts.length; i < out.length - 2; i++) {
    x = (x * 1103515245 + 12345) & 0x7fffffff;
    out[i] = x & 0x7f;
  }
  out.set([0xff, 0xd9], out.length - 2);
  return out;
}

/** APP1 Exif, big-endian: IFD0 with a pointer to the Exif IFD, which holds DateTimeOriginal ("YYYY:MM:DD HH:MM:SS"). */
function exifSegment(taken: string): number[] {
  const tiff: number[] = [0x4d, 0x4d, 0x00, 0x2a, 0, 0, 0, 8];
  const u16 = (n: number) => [n >> 8, n & 0xff];
  const u32 = (n: number) => [(n >>> 24) & 0xff, (n >> 16) & 0xff, (n >> 8) & 0xff, n & 0xff];
  // IFD0 at 8: one entry (ExifIFD pointer), next-IFD 0. Size 2 + 12 + 4 = 18, so the Exif IFD starts at 26.
  tiff.push(...u16(1), ...u16(0x8769), ...u16(4), ...u32(1), ...u32(26), ...u32(0));
  // Exif IFD at 26: one entry (DateTimeOriginal, ASCII, 20 bytes at 44), next 0.
  tiff.push(...u16(1), ...u16(0x9003), ...u16(2), ...u32(20), ...u32(44), ...u32(0));
  for (const ch of `${taken}\0`) tiff.push(ch.charCodeAt(0));
  const body = [0x45, 0x78, 0x69, 0x66, 0, 0, ...tiff];
  return [0xff, 0xe1, ...u16(body.length + 2), ...body];
}
