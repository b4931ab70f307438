import { UnprocessableEntityException } from '@nestjs/common';
import sharp from 'sharp';

/**
 * Drawn on the phone, so it is the user's content: anything that could reach outside the drawing (scripts, linked
 * images or files, entities, CSS urls) is refused rather than given to the renderer.
 */
const REACHES_OUT = /<!DOCTYPE|<!ENTITY|<script|<foreignObject|<image|<use|<style|(?:xlink:)?href\s*=|url\s*\(|@import/i;
const IS_SVG = /^\s*(<\?xml[^>]*\?>\s*)?<svg[\s>]/i;

const UNREADABLE = 'The signature drawn at sign-off cannot be read, so it cannot go on the certificate. Reopen the visit and have it signed again.';

/** The visit's signature (an SVG drawn on the phone) as a PNG for the certificate. */
export async function signatureImage(svg: string): Promise<Buffer> {
  if (!IS_SVG.test(svg) || REACHES_OUT.test(svg)) throw new UnprocessableEntityException([UNREADABLE]);
  try {
    return await sharp(Buffer.from(svg), { density: 144, limitInputPixels: 16_000_000 })
      .resize({ width: 900, height: 300, fit: 'inside' })
      // On paper it is ink on white; without transparency the PDF needs no mask for it.
      .flatten({ background: '#ffffff' })
      .png()
      .toBuffer();
  } catch {
    throw new UnprocessableEntityException([UNREADABLE]);
  }
}
