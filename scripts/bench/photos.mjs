// Photos: a 12-megapixel JPEG through tus upload, hash check and the server-made sizes, against the floor of
// sharp alone making the same two sizes (and the hash) from the same file; and photos per second on this machine.
import { createHash } from 'node:crypto';
import sharp from 'sharp';
import { signIn, startApi, timed } from './harness.mjs';

const CHUNK = 1024 * 1024;

/** A 4000 × 3000 photo-like JPEG: noise keeps it as large as a camera's. */
async function twelveMegapixels(seed) {
  const width = 4000;
  const height = 3000;
  const raw = Buffer.alloc(width * height * 3);
  let x = seed * 2654435761;
  for (let i = 0; i < raw.length; i++) {
    x = (x * 1103515245 + 12345) >>> 0;
    raw[i] = (x >>> 24) & 0x7f;
  }
  return sharp(raw, { raw: { width, height, channels: 3 } }).blur(1.2).jpeg({ quality: 88 }).toBuffer();
}

const sha256 = (b) => createHash('sha256').update(b).digest('hex');
const meta = (o) => Object.entries(o).map(([k, v]) => `${k} ${Buffer.from(v).toString('base64')}`).join(',');

async function uploadOne(base, token, bytes) {
  const headers = { authorization: `Bearer ${token}`, 'tus-resumable': '1.0.0' };
  const created = await fetch(`${base}/api/uploads`, { method: 'POST', headers: { ...headers, 'upload-length': String(bytes.length), 'upload-metadata': meta({ sha256: sha256(bytes), filetype: 'image/jpeg', filename: 'bench.jpg' }) } });
  if (created.status !== 201) throw new Error(`create answered ${created.status}`);
  const location = created.headers.get('location');
  for (let offset = 0; offset < bytes.length; ) {
    const res = await fetch(`${base}${location}`, {
      method: 'PATCH',
      headers: { ...headers, 'upload-offset': String(offset), 'content-type': 'application/offset+octet-stream' },
      body: bytes.subarray(offset, offset + CHUNK),
    });
    if (res.status !== 204) throw new Error(`upload answered ${res.status}: ${await res.text()}`);
    offset = Number(res.headers.get('upload-offset'));
  }
}

export async function benchPhotos({ port = 3606 } = {}) {
  const api = await startApi({ port });
  try {
    const tech = await signIn(api.base, 'office@larkfield.example');
    const photos = await Promise.all([1, 2, 3, 4, 5, 6].map(twelveMegapixels));
    const floor = await timed(async () => {
      const source = sharp(photos[0], { failOn: 'error' }).rotate();
      sha256(photos[0]);
      await Promise.all([
        source.clone().resize(320, 320, { fit: 'inside' }).webp({ quality: 72 }).toBuffer(),
        source.clone().resize(1600, 1600, { fit: 'inside' }).webp({ quality: 82 }).toBuffer(),
      ]);
    });
    const one = await timed(() => uploadOne(api.base, tech.accessToken, photos[0]));
    // Throughput: the other five photos, two at a time as two phones would.
    const batch = await timed(async () => {
      const queue = photos.slice(1);
      await Promise.all([0, 1].map(async () => {
        for (let p = queue.shift(); p; p = queue.shift()) await uploadOne(api.base, tech.accessToken, p);
      }));
    });
    const mb = (photos[0].length / 1e6).toFixed(1);
    return [
      { name: `photos: one 12 MP JPEG (${mb} MB) uploaded and sized`, measuredMs: one.ms, floorMs: floor.ms, floorDisplay: `${floor.ms.toFixed(0)} ms (sharp alone)`, target: 1.3 },
      { name: 'photos: throughput, two uploads at a time', measuredMs: batch.ms, display: `${(5 / (batch.ms / 1000)).toFixed(2)} photos/s` },
    ];
  } finally {
    await api.stop();
  }
}
