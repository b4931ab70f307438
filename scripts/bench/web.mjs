// Web: gzipped JavaScript loaded for the technician's first screen and for the office's, and the offline cold
// start to Today in headless Chromium (service worker in control, network off).
import { gzipSync } from 'node:zlib';
import { launchChromium } from './browser.mjs';
import { median, PASSWORD, startApi, timed } from './harness.mjs';

const jsKb = (page) => {
  const scripts = new Map();
  page.on('response', async (res) => {
    if (res.url().endsWith('.js') && res.ok()) scripts.set(res.url(), gzipSync(await res.body()).length);
  });
  return () => [...scripts.values()].reduce((a, b) => a + b, 0) / 1024;
};

/**
 * Gzipped JavaScript from the sign-in page to the role's first screen, and then for that first screen alone when
 * already signed in (what a technician downloads every morning, opening the app from the home screen).
 */
async function firstScreenJs(browser, base, email, viewport, heading, path) {
  const context = await browser.newContext({ viewport, serviceWorkers: 'block' });
  const page = await context.newPage();
  const signingIn = jsKb(page);
  await page.goto(`${base}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('heading', { name: heading, level: 1 }).waitFor();
  await page.waitForLoadState('networkidle');
  const withSignIn = signingIn();
  await page.close();
  const again = await context.newPage();
  const opening = jsKb(again);
  await again.goto(`${base}${path}`);
  await again.getByRole('heading', { name: heading, level: 1 }).waitFor();
  await again.waitForLoadState('networkidle');
  const signedIn = opening();
  await context.close();
  return { withSignIn, signedIn };
}

export async function benchWeb({ port = 3603 } = {}) {
  const api = await startApi({ port });
  const browser = await launchChromium();
  try {
    const tech = await firstScreenJs(browser, api.base, 'tech1@larkfield.example', { width: 390, height: 844 }, 'Today', '/today');
    const office = await firstScreenJs(browser, api.base, 'office@larkfield.example', { width: 1440, height: 900 }, 'Jobs', '/jobs');

    const context = await browser.newContext({ viewport: { width: 390, height: 844 }, serviceWorkers: 'allow' });
    const page = await context.newPage();
    await page.goto(`${api.base}/sign-in`);
    await page.getByLabel('E-mail').fill('tech1@larkfield.example');
    await page.getByLabel('Password').fill(PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText('Up to date').waitFor({ timeout: 60_000 });
    await page.evaluate(async () => {
      await navigator.serviceWorker.ready;
    });
    await page.close();
    await context.setOffline(true);
    const starts = [];
    for (let i = 0; i < 5; i++) {
      const cold = await context.newPage();
      const { ms } = await timed(async () => {
        await cold.goto(`${api.base}/today`);
        await cold.getByRole('heading', { name: 'Today', level: 1 }).waitFor();
        await cold.getByRole('region', { name: 'My visits' }).waitFor();
      });
      starts.push(ms);
      await cold.close();
    }
    await context.close();
    const coldStart = median(starts);
    return [
      { name: "web: technician's first screen JS, signed in (gzip)", measuredMs: tech.signedIn, display: `${tech.signedIn.toFixed(0)} KB`, targetDisplay: '≤ 200 KB', ok: tech.signedIn <= 200 },
      { name: 'web: technician, sign-in page to Today (gzip)', measuredMs: tech.withSignIn, display: `${tech.withSignIn.toFixed(0)} KB` },
      { name: "web: office's first screen JS, signed in (gzip)", measuredMs: office.signedIn, display: `${office.signedIn.toFixed(0)} KB` },
      { name: 'web: office, sign-in page to Jobs (gzip)', measuredMs: office.withSignIn, display: `${office.withSignIn.toFixed(0)} KB` },
      { name: 'web: offline cold start to Today (median of 5)', measuredMs: coldStart, display: `${coldStart.toFixed(0)} ms`, targetDisplay: '< 1000 ms', ok: coldStart < 1000 },
    ];
  } finally {
    await browser.close();
    await api.stop();
  }
}
