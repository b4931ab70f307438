import { randomBytes } from 'node:crypto';
import sharp from 'sharp';

/** Photos for browser tests, made here with sharp: no image file is kept in the repository. */

const pad = (n: number) => String(n).padStart(2, '0');
/** "YYYY:MM:DD HH:MM:SS" today, as a camera writes DateTimeOriginal. */
export const exifToday = (hours: number, minutes: number) => {
  const d = new Date();
  return `${d.getFullYear()}:${pad(d.getMonth() + 1)}:${pad(d.getDate())} ${pad(hours)}:${pad(minutes)}:00`;
};

/** Fine grain, so the JPEG weighs what a camera's does (a few MB) and goes up in several chunks. */
async function grain(): Promise<Buffer> {
  const pixels = randomBytes(512 * 512 * 3).map((b) => 100 + (b % 56));
  return sharp(pixels, { raw: { width: 512, height: 512, channels: 3 } }).png().toBuffer();
}

/** A camera-sized JPEG drawn here (a wall, a back box and a cable route), with its time and orientation in EXIF. */
export async function cameraJpeg(label: string, wall: string, taken: string, orientation = 1): Promise<Buffer> {
  const svg = `<svg width="4000" height="3000" xmlns="http://www.w3.org/2000/svg">
    <rect width="100%" height="100%" fill="${wall}"/>
    <rect x="1700" y="1200" width="600" height="600" rx="30" fill="#d9d4c7" stroke="#3b3b3b" stroke-width="24"/>
    <path d="M2000 1200 V200" stroke="#b5651d" stroke-width="60" fill="none"/>
    <text x="160" y="420" font-family="sans-serif" font-size="260" fill="#ffffff">${label}</text>
  </svg>`;
  return sharp(Buffer.from(svg))
    .composite([{ input: await grain(), tile: true, blend: 'soft-light' }])
    .withExif({ IFD2: { DateTimeOriginal: taken } })
    .withMetadata({ orientation })
    .jpeg({ quality: 90 })
    .toBuffer();
}

/** A photo of pure noise: it hardly compresses, so even scaled down on the phone it goes up in several 1 MB chunks. */
export function noisyPhoto(width = 3000, height = 2250): Promise<Buffer> {
  return sharp(randomBytes(width * height * 3), { raw: { width, height, channels: 3 } }).jpeg({ quality: 92 }).toBuffer();
}
