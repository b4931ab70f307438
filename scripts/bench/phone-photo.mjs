// Phone photo: a 12-megapixel JPEG from the camera input to saved on the phone, in the built app in headless
// Chromium (offline, as on site), against the floor of the same shrink done directly in the app's worker in the same
// page. Samples alternate between the two and the medians are compared; the page's longest frame while a photo is
// made ready says whether the screen stayed responsive.
/* global window, document, requestAnimationFrame, MutationObserver, Worker -- these run in the page, through page.evaluate */
import { launchChromium } from './browser.mjs';
import { median, PASSWORD, SAMPLES, startApi } from './harness.mjs';
import { numbered, twelveMegapixels } from './photos.mjs';

const WARM_UPS = 2;
const TARGET_MS = 1500;

/** Times, inside the page, from the camera input's change to the trail's "saved" line, and the longest frame gap. */
async function armProbe(page) {
  await page.evaluate(() => {
    const probe = { start: 0, end: 0, longestFrame: 0, sawForm: false };
    window.__photoProbe = probe;
    document.addEventListener('change', () => {
      probe.start = performance.now();
      let last = probe.start;
      const frame = (now) => {
        probe.longestFrame = Math.max(probe.longestFrame, now - last);
        last = now;
        if (!probe.end) requestAnimationFrame(frame);
      };
      requestAnimationFrame(frame);
    }, { capture: true, once: true });
    // The last photo's "saved" line is still there until the form opens; only a new one after the form counts.
    const saved = new MutationObserver(() => {
      if (!probe.start) return;
      if (document.querySelector('form[aria-label="Photo details"]')) {
        probe.sawForm = true;
        return;
      }
      if (probe.sawForm && /saved on this phone/.test(document.body.textContent ?? '')) {
        probe.end = performance.now();
        saved.disconnect();
      }
    });
    saved.observe(document.body, { subtree: true, childList: true, characterData: true });
  });
}

async function throughTheApp(page, bytes, n) {
  await armProbe(page);
  await page.getByLabel('Take or add photos').setInputFiles({ name: `IMG_${n}.jpg`, mimeType: 'image/jpeg', buffer: bytes });
  await page.getByRole('button', { name: 'Save photo' }).click();
  await page.waitForFunction(() => window.__photoProbe.end > 0, null, { timeout: 60_000 });
  const probe = await page.evaluate(() => window.__photoProbe);
  // Ready for the next photo: the saved line is cleared when the next one is chosen.
  return { ms: probe.end - probe.start, longestFrame: probe.longestFrame };
}

/**
 * The same shrink with the same settings, asked of the app's own worker script directly; one worker kept for the
 * run, as the app keeps its own, so that neither side pays for starting one.
 */
async function inTheWorker(page, workerUrl) {
  return page.evaluate(async (url) => {
    window.__benchWorker ??= new Worker(url, { type: 'module' });
    const worker = window.__benchWorker;
    const start = performance.now();
    await new Promise((resolve, reject) => {
      worker.onmessage = (e) => (e.data.error ? reject(new Error(e.data.error)) : resolve(e.data));
      worker.onerror = (e) => reject(new Error(e.message));
      worker.postMessage({ id: 1, file: window.__benchFile, longEdge: 2560, thumbEdge: 320, quality: 0.85, thumbQuality: 0.7 });
    });
    return performance.now() - start;
  }, workerUrl);
}

export async function benchPhonePhoto({ port = 3608 } = {}) {
  const api = await startApi({ port });
  const browser = await launchChromium();
  try {
    const original = await twelveMegapixels(3);
    const context = await browser.newContext({ viewport: { width: 390, height: 844 }, serviceWorkers: 'allow' });
    const page = await context.newPage();
    const violations = [];
    page.on('console', (m) => /Content Security Policy/i.test(m.text()) && violations.push(m.text()));
    let workerUrl = null;
    page.on('worker', (w) => {
      if (/shrink-worker/.test(w.url())) workerUrl = w.url();
    });
    await page.goto(`${api.base}/sign-in`);
    await page.getByLabel('E-mail').fill('tech1@larkfield.example');
    await page.getByLabel('Password').fill(PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText('Up to date').waitFor({ timeout: 60_000 });
    // The service worker holds the app, the worker script included, as it does on a phone used offline.
    await page.evaluate(async () => {
      await navigator.serviceWorker.ready;
      if (!navigator.serviceWorker.controller) await new Promise((r) => navigator.serviceWorker.addEventListener('controllerchange', r, { once: true }));
    });
    await page.getByRole('region', { name: 'My visits' }).getByRole('link').first().click();
    await page.getByLabel('Take or add photos').waitFor({ state: 'attached' });
    // On site there is often no signal; and an upload must not share the two cores with what is measured.
    await context.setOffline(true);
    await page.evaluate((b64) => {
      const bytes = Uint8Array.from(atob(b64), (c) => c.charCodeAt(0));
      window.__benchFile = new File([bytes], 'IMG_0001.jpg', { type: 'image/jpeg' });
    }, original.toString('base64'));

    let n = 0;
    for (let i = 0; i < WARM_UPS; i++) await throughTheApp(page, numbered(original, ++n), n);
    if (!workerUrl) throw new Error(`the photo worker never started${violations.length ? `: ${violations[0]}` : ''}`);
    for (let i = 0; i < WARM_UPS; i++) await inTheWorker(page, workerUrl);

    const app = [];
    const frames = [];
    const floor = [];
    for (let i = 0; i < SAMPLES; i++) {
      const runApp = async () => {
        const r = await throughTheApp(page, numbered(original, ++n), n);
        app.push(r.ms);
        frames.push(r.longestFrame);
      };
      const runFloor = async () => floor.push(await inTheWorker(page, workerUrl));
      for (const run of i % 2 ? [runApp, runFloor] : [runFloor, runApp]) await run();
    }
    await context.close();
    const measuredMs = median(app);
    const floorMs = median(floor);
    const mb = (original.length / 1e6).toFixed(1);
    return {
      name: `phone-photo: one 12 MP JPEG (${mb} MB), camera input to saved on the phone, offline, median of ${SAMPLES}`,
      measuredMs,
      display: `${measuredMs.toFixed(0)} ms, longest frame ${median(frames).toFixed(0)} ms${violations.length ? `, ${violations.length} CSP violations` : ''}`,
      floorMs,
      floorDisplay: `${floorMs.toFixed(0)} ms (the same shrink in the app's worker)`,
      targetDisplay: `≤ ${TARGET_MS} ms`,
      ok: measuredMs <= TARGET_MS && violations.length === 0,
      samples: { measured: app, floor, longestFrame: frames },
    };
  } finally {
    await browser.close();
    await api.stop();
  }
}
