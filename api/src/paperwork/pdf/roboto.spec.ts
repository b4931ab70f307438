import { describe, expect, it } from '@jest/globals';
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import PDFDocument from 'pdfkit';
import { PDFParse } from 'pdf-parse';
import { roboto, woffToSfnt } from './roboto.js';

const require = createRequire(import.meta.url);

describe('roboto', () => {
  it('unwraps a WOFF font into the TrueType file it carries, table for table', () => {
    const woff = readFileSync(require.resolve('roboto-fontface/fonts/roboto/Roboto-Regular.woff'));
    const sfnt = woffToSfnt(woff);
    expect(sfnt.readUInt32BE(0)).toBe(woff.readUInt32BE(4));
    expect(sfnt.readUInt16BE(4)).toBe(woff.readUInt16BE(12));
    // WOFF records the unwrapped size of the whole font.
    expect(sfnt.length).toBe(woff.readUInt32BE(16));
    expect(() => woffToSfnt(Buffer.from('not a font at all, not even close'))).toThrow('Not a WOFF font.');
  });

  it('writes the symbols a certificate needs, and they read back as text', async () => {
    const doc = new PDFDocument();
    const chunks: Buffer[] = [];
    doc.on('data', (c: Buffer) => chunks.push(c));
    const ended = new Promise((resolve) => doc.on('end', resolve));
    for (const [weight, font] of Object.entries(roboto())) doc.registerFont(weight, font);
    doc.font('regular').text('Zs 0.63 Ω ≤ 1.10 Ω; ≥ 1.0 MΩ; 2.5 / 1.5 mm²; 5 × 30 mA; IΔn');
    doc.font('bold').text('Pass');
    doc.end();
    await ended;
    const parser = new PDFParse({ data: new Uint8Array(Buffer.concat(chunks)) });
    const { text } = await parser.getText();
    await parser.destroy();
    expect(text).toContain('Zs 0.63 Ω ≤ 1.10 Ω; ≥ 1.0 MΩ; 2.5 / 1.5 mm²; 5 × 30 mA; IΔn');
    expect(text).toContain('Pass');
  });
});
