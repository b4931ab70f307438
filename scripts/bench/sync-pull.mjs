// Sync pull: a technician's first full pull of 20,000 rows — the server's time, and in Chromium the whole first
// sync of the real app until it says "Up to date" — against the floor of the same server pull plus a Dexie
// bulkPut of the same rows in the same browser.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { v7 as uuidv7 } from 'uuid';
import { root } from '../lib.mjs';
import { launchChromium } from './browser.mjs';
import { median, PASSWORD, SAMPLES, signIn, startApi, timed } from './harness.mjs';

const ROWS = 20_000;

async function pullAll(base, token, deviceId) {
  const rows = [];
  let checkpoint = 0;
  for (;;) {
    const res = await fetch(`${base}/api/sync/pull?checkpoint=${checkpoint}&limit=1000&deviceId=${deviceId}`, { headers: { authorization: `Bearer ${token}` } });
    const page = await res.json();
    rows.push(...page.changes);
    checkpoint = page.checkpoint;
    if (!page.hasMore) return rows;
  }
}

export async function benchSyncPull({ port = 3602 } = {}) {
  const api = await startApi({ port });
  try {
    const office = await signIn(api.base, 'office@larkfield.example');
    const auth = { authorization: `Bearer ${office.accessToken}`, 'content-type': 'application/json' };
    const tech = await signIn(api.base, 'tech1@larkfield.example');
    const mine = (await pullAll(api.base, tech.accessToken, 'bench-probe')).find((c) => c.entity === 'visit' && c.row.technicianIds.includes(tech.user.id)).row;
    // Fill the technician's site with notes until their scope holds 20,000 rows.
    const existing = (await pullAll(api.base, tech.accessToken, 'bench-count')).length;
    const needed = ROWS - existing;
    for (let i = 0; i < needed; i += 500) {
      const mutations = Array.from({ length: Math.min(500, needed - i) }, (_, j) => ({
        mutationId: uuidv7(), entity: 'note', id: uuidv7(), baseVersion: 0,
        set: { visitId: mine.id, siteId: mine.siteId, text: `Pull bench note ${i + j}: cable route photographed before boarding` },
        hlc: `${new Date().toISOString()}-${(j % 65535).toString(16).padStart(4, '0')}-benchoffice`,
      }));
      const res = await fetch(`${api.base}/api/sync/push`, { method: 'POST', headers: auth, body: JSON.stringify({ deviceId: 'benchoffice', mutations }) });
      if (!res.ok) throw new Error(`seeding failed: ${res.status}`);
    }
    const browser = await launchChromium();
    try {
      // Taken in turn, several times: a single run swings with the machine; the rows compare medians.
      const samples = [];
      let rows = [];
      for (let i = 0; i < SAMPLES; i++) {
        const server = await timed(() => pullAll(api.base, tech.accessToken, `bench-server-${i}`));
        rows = server.value.filter((c) => !c.deleted).map((c) => ({ ...c.row, _entity: c.entity }));
        // A new context is a phone with nothing stored yet.
        const context = await browser.newContext({ viewport: { width: 390, height: 844 }, serviceWorkers: 'block' });
        const page = await context.newPage();
        await page.route('**/__bench/dexie.mjs', (route) =>
          route.fulfill({ contentType: 'text/javascript', body: readFileSync(join(root, 'node_modules/dexie/dist/dexie.mjs'), 'utf8') }),
        );
        await page.goto(`${api.base}/sign-in`);
        await page.getByLabel('E-mail').fill('tech1@larkfield.example');
        await page.getByLabel('Password').fill(PASSWORD);
        const app = await timed(async () => {
          await page.getByRole('button', { name: 'Sign in' }).click();
          await page.getByText('Up to date').waitFor({ timeout: 300_000 });
        });
        const bulkPutMs = await page.evaluate(async (data) => {
          const { Dexie } = await import('/__bench/dexie.mjs');
          const db = new Dexie('bench-floor');
          db.version(1).stores({ rows: 'id' });
          const t0 = performance.now();
          await db.table('rows').bulkPut(data);
          const ms = performance.now() - t0;
          await db.delete();
          return ms;
        }, rows);
        await context.close();
        samples.push({ server: server.ms, app: app.ms, bulkPut: bulkPutMs });
      }
      const serverMs = median(samples.map((x) => x.server));
      const appMs = median(samples.map((x) => x.app));
      const bulkPutMs = median(samples.map((x) => x.bulkPut));
      const floorMs = serverMs + bulkPutMs;
      return [
        { name: `sync pull: server, first pull of ${rows.length} rows, median of ${SAMPLES}`, measuredMs: serverMs, display: `${serverMs.toFixed(0)} ms`, note: 'absolute, for reference' },
        {
          name: `sync pull: app's first sync of ${rows.length} rows in Chromium, median of ${SAMPLES}`,
          measuredMs: appMs,
          floorMs,
          floorDisplay: `${floorMs.toFixed(0)} ms (server ${serverMs.toFixed(0)} + Dexie bulkPut ${bulkPutMs.toFixed(0)})`,
          target: 2,
        },
      ];
    } finally {
      await browser.close();
    }
  } finally {
    await api.stop();
  }
}
