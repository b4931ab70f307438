import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { inflateSync } from 'node:zlib';

export type FontWeight = 'regular' | 'medium' | 'bold' | 'italic';

const require = createRequire(import.meta.url);
/** The full Roboto (not a latin subset): certificates need Ω, ≤, ≥, ² and ×. */
const FILES: Record<FontWeight, string> = {
  regular: 'Roboto-Regular.woff',
  medium: 'Roboto-Medium.woff',
  bold: 'Roboto-Bold.woff',
  italic: 'Roboto-RegularItalic.woff',
};

/**
 * A WOFF 1.0 font as the plain TrueType/OpenType file it wraps: the same tables, inflated. The PDF library reads a
 * WOFF too, but inflates it again glyph by glyph for every document, which made a certificate take seconds.
 */
export function woffToSfnt(woff: Buffer): Buffer {
  if (woff.toString('latin1', 0, 4) !== 'wOFF') throw new Error('Not a WOFF font.');
  const flavor = woff.readUInt32BE(4);
  const count = woff.readUInt16BE(12);
  const tables = Array.from({ length: count }, (_, i) => {
    const at = 44 + i * 20;
    const offset = woff.readUInt32BE(at + 4);
    const stored = woff.readUInt32BE(at + 8);
    const length = woff.readUInt32BE(at + 12);
    const raw = woff.subarray(offset, offset + stored);
    return { tag: woff.toString('latin1', at, at + 4), checksum: woff.readUInt32BE(at + 16), data: stored < length ? inflateSync(raw) : raw };
  });
  const selector = Math.floor(Math.log2(count));
  const range = 2 ** selector * 16;
  const header = Buffer.alloc(12 + count * 16);
  header.writeUInt32BE(flavor, 0);
  header.writeUInt16BE(count, 4);
  header.writeUInt16BE(range, 6);
  header.writeUInt16BE(selector, 8);
  header.writeUInt16BE(count * 16 - range, 10);
  let offset = header.length;
  const bodies = tables.map((t, i) => {
    const at = 12 + i * 16;
    header.write(t.tag, at, 'latin1');
    header.writeUInt32BE(t.checksum, at + 4);
    header.writeUInt32BE(offset, at + 8);
    header.writeUInt32BE(t.data.length, at + 12);
    // Each table starts on a four-byte boundary.
    const padded = Buffer.alloc((t.data.length + 3) & ~3);
    t.data.copy(padded);
    offset += padded.length;
    return padded;
  });
  return Buffer.concat([header, ...bodies]);
}

let fonts: Record<FontWeight, Buffer> | null = null;

/** Roboto from roboto-fontface, unwrapped once per process. */
export function roboto(): Record<FontWeight, Buffer> {
  const load = (weight: FontWeight) => woffToSfnt(readFileSync(require.resolve(`roboto-fontface/fonts/roboto/${FILES[weight]}`)));
  fonts ??= { regular: load('regular'), medium: load('medium'), bold: load('bold'), italic: load('italic') };
  return fonts;
}
