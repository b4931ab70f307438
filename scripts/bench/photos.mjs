// Photos: a 12-megapixel JPEG through tus upload, hash check and the server-made sizes, against the floor of
// sharp alone making the same two sizes (and the hash) from the same file; and photos per second on this machine.
// Both sides are warmed up first, then measured in alternating pairs so that both see the same load on a shared
// machine, and the medians are compared.
import { createHash } from 'node:crypto';
import sharp from 'sharp';
import { median, signIn, startApi, timed } from './harness.mjs';

const CHUNK = 1024 * 1024;
const WARM_UPS = 2;
const SAMPLES = 7;
const BATCHES = 3;
const BATCH = 6;

/** A 4000 × 3000 photo-like JPEG: noise keeps it as large as a camera's. */
export async function twelveMegapixels(seed) {
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

/**
 * The same photo with its number in a JPEG comment (COM) segment after the JFIF header: other bytes and another
 * hash, so the server never finds it already held, and exactly the same pixels to decode.
 */
export function numbered(jpeg, n) {
  const text = Buffer.from(`bench photo ${n}`);
  const marker = Buffer.alloc(4);
  marker.writeUInt16BE(0xfffe, 0);
  marker.writeUInt16BE(text.length + 2, 2);
  const at = jpeg.readUInt16BE(2) === 0xffe0 ? 4 + jpeg.readUInt16BE(4) : 2;
  return Buffer.concat([jpeg.subarray(0, at), marker, text, jpeg.subarray(at)]);
}

const sha256 = (b) => createHash('sha256').update(b).digest('hex');
const meta = (o) => Object.entries(o).map(([k, v]) => `${k} ${Buffer.from(v).toString('base64')}`).join(',');

export async function uploadOne(base, token, bytes) {
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

/**
 * sharp alone: the hash, and the same two sizes with the same settings and the same recipe as the server (one
 * decode at the display size, the thumbnail from those pixels), so that the ratio is the server's own cost.
 */
async function sharpAlone(bytes) {
  sha256(bytes);
  const { data, info } = await sharp(bytes, { failOn: 'error' }).rotate().resize(1600, 1600, { fit: 'inside' }).raw().toBuffer({ resolveWithObject: true });
  const pixels = () => sharp(data, { raw: { width: info.width, height: info.height, channels: info.channels } });
  await Promise.all([pixels().resize(320, 320, { fit: 'inside' }).webp({ quality: 72 }).toBuffer(), pixels().webp({ quality: 82 }).toBuffer()]);
}

export async function benchPhotos({ port = 3606 } = {}) {
  const api = await startApi({ port });
  try {
    const tech = await signIn(api.base, 'office@larkfield.example');
    const original = await twelveMegapixels(1);
    let n = 0;
    const next = () => numbered(original, ++n);
    const upload = (bytes) => uploadOne(api.base, tech.accessToken, bytes);

    // The server's first photo and sharp's first sizes in this process pay for loading code; neither is measured.
    for (let i = 0; i < WARM_UPS; i++) {
      await sharpAlone(original);
      await upload(next());
    }
    const floor = [];
    const one = [];
    for (let i = 0; i < SAMPLES; i++) {
      const bytes = next();
      // Alternating which goes first, so that neither always follows the other's leftovers.
      const order = i % 2 ? [[one, () => upload(bytes)], [floor, () => sharpAlone(bytes)]] : [[floor, () => sharpAlone(bytes)], [one, () => upload(bytes)]];
      for (const [into, run] of order) into.push((await timed(run)).ms);
    }

    // Throughput: batches of photos, two at a time as two phones would.
    const rates = [];
    for (let b = 0; b < BATCHES; b++) {
      const queue = Array.from({ length: BATCH }, next);
      const { ms } = await timed(() => Promise.all([0, 1].map(async () => {
        for (let p = queue.shift(); p; p = queue.shift()) await upload(p);
      })));
      rates.push(BATCH / (ms / 1000));
    }
    const mb = (original.length / 1e6).toFixed(1);
    const floorMs = median(floor);
    return [
      {
        name: `photos: one 12 MP JPEG (${mb} MB) uploaded and sized, median of ${SAMPLES}`,
        measuredMs: median(one),
        floorMs,
        floorDisplay: `${floorMs.toFixed(0)} ms (sharp alone)`,
        target: 1.3,
        samples: { measured: one, floor },
      },
      { name: `photos: throughput, two uploads at a time, median of ${BATCHES} batches of ${BATCH}`, measuredMs: 1000 / median(rates), display: `${median(rates).toFixed(2)} photos/s`, samples: rates },
    ];
  } finally {
    await api.stop();
  }
}
