import { describe, expect, it } from '@jest/globals';
import sharp from 'sharp';
import { signatureImage } from './signature-image.js';

const DRAWN = '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 600 180" width="600" height="180"><path d="M20 150 C 80 20 140 20 200 120 S 400 40 580 60" fill="none" stroke="#15232a" stroke-width="4"/></svg>';

describe('signatureImage', () => {
  it('draws the signature from the phone as an opaque PNG for the certificate', async () => {
    const png = await signatureImage(DRAWN);
    const meta = await sharp(png).metadata();
    expect(meta).toMatchObject({ format: 'png', width: 900, height: 270, hasAlpha: false });
    // The ink is there: the darkest pixel is the stroke's colour, not the white behind it.
    const { channels } = await sharp(png).stats();
    expect(channels[0]!.min).toBeLessThan(60);
    expect(channels[0]!.max).toBe(255);
  });

  it('refuses a drawing that reaches outside itself, or is not a drawing', async () => {
    for (const svg of [
      '<svg xmlns="http://www.w3.org/2000/svg"><image href="file:///etc/passwd" width="10" height="10"/></svg>',
      '<svg xmlns="http://www.w3.org/2000/svg" xmlns:xlink="http://www.w3.org/1999/xlink"><use xlink:href="other.svg#a"/></svg>',
      '<!DOCTYPE svg [<!ENTITY x SYSTEM "file:///etc/hostname">]><svg xmlns="http://www.w3.org/2000/svg"><text>&x;</text></svg>',
      '<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>',
      '<svg xmlns="http://www.w3.org/2000/svg"><rect style="fill:url(http://example.com/x)" width="9" height="9"/></svg>',
      'a signature',
      '<svg xmlns="http://www.w3.org/2000/svg"><path d="M0 0 L',
    ]) {
      await expect(signatureImage(svg)).rejects.toMatchObject({ status: 422 });
    }
  });
});
