// Web: gzipped JavaScript loaded for the technician's first screen and for the office's, and the offline cold
// start to Today in headless Chromium (service worker in control, network off).
import { gzipSync } from 'node:zlib';
import { launchChromium } from './browser.mjs';
import { PASSWORD, startApi, timed } from './harness.mjs';

async function firstScreenJs(browser, base, email, viewport, heading) {
  const context = await browser.newContext({ viewport, serviceWorkers: 'block' });
  const page = await context.newPage();
  const scripts = new Map();
  page.on('response', async (res) => {
    if (res.url().endsWith('.js') && res.ok()) scripts.set(res.url(), gzipSync(await res.body()).length);
  });
  await page.goto(`${base}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('heading', { name: heading, level: 1 }).waitFor();
  await page.waitForLoadState('networkidle');
  await context.close();
  return [...scripts.values()].reduce((a, b) => a + b, 0) / 1024;
}

export async function benchWeb({ port = 3603 } = {}) {
  const api = await startApi({ port });
  const browser = await launchChromium();
  try {
    const techKb = await firstScreenJs(browser, api.base, 'tech1@larkfield.example', { width: 390, height: 844 }, 'Today');
    const officeKb = await firstScreenJs(browser, api.base, 'office@larkfield.example', { width: 1440, height: 900 }, 'Jobs');

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
    starts.sort((a, b) => a - b);
    const median = starts[Math.floor(starts.length / 2)];
    return [
      { name: "web: technician's first screen JS (gzip)", measuredMs: techKb, display: `${techKb.toFixed(0)} KB`, targetDisplay: '≤ 200 KB', ok: techKb <= 200 },
      { name: "web: office's first screen JS (gzip)", measuredMs: officeKb, display: `${officeKb.toFixed(0)} KB` },
      { name: 'web: offline cold start to Today (median of 5)', measuredMs: median, display: `${median.toFixed(0)} ms`, targetDisplay: '< 1000 ms', ok: median < 1000 },
    ];
  } finally {
    await browser.close();
    await api.stop();
  }
}
