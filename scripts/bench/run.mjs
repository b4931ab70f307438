#!/usr/bin/env node
// `npm run bench`: every benchmark, each against a floor measured in the same run; prints a table and writes JSON.
import { mkdirSync, writeFileSync } from 'node:fs';
import { cpus, totalmem } from 'node:os';
import { join } from 'node:path';
import { root } from '../lib.mjs';
import { ensureBuilt, printTable } from './harness.mjs';
import { benchWeb } from './web.mjs';
import { benchApiLoad } from './api-load.mjs';
import { benchPhotos } from './photos.mjs';
import { benchPhonePhoto } from './phone-photo.mjs';
import { benchSyncPull } from './sync-pull.mjs';
import { benchSyncPush } from './sync-push.mjs';
import { benchScale } from './scale.mjs';

const only = process.argv.slice(2);
const suites = { 'sync-push': benchSyncPush, 'sync-pull': benchSyncPull, 'api-load': benchApiLoad, photos: benchPhotos, 'phone-photo': benchPhonePhoto, web: benchWeb, scale: benchScale };

ensureBuilt();
const results = [];
for (const [name, run] of Object.entries(suites)) {
  if (only.length && !only.includes(name)) continue;
  process.stdout.write(`running ${name}…\n`);
  results.push(...[].concat(await run()));
}

const rows = results.map((r) => {
  const ratio = r.floorMs != null ? r.measuredMs / r.floorMs : null;
  return {
    name: r.name,
    measured: r.display ?? `${r.measuredMs.toFixed(0)} ms${r.perSecond ? ` (${Math.round(r.perSecond)}/s)` : ''}`,
    floor: r.floorDisplay ?? (r.floorMs != null ? `${r.floorMs.toFixed(0)} ms` : null),
    ratio,
    target: r.targetDisplay ?? (r.target != null ? `≤ ${r.target}×` : null),
    ok: r.ok ?? (ratio != null && r.target != null ? ratio <= r.target : null),
  };
});
printTable(rows);
const machine = { cpus: cpus().length, cpuModel: cpus()[0]?.model, memoryGb: Math.round(totalmem() / 2 ** 30), node: process.version, date: new Date().toISOString() };
const out = join(root, 'data', 'bench');
mkdirSync(out, { recursive: true });
writeFileSync(join(out, 'latest.json'), JSON.stringify({ machine, results: rows, raw: results }, null, 2));
console.log(`Machine: ${machine.cpus} × ${machine.cpuModel}, ${machine.memoryGb} GB, Node ${machine.node}. Written to data/bench/latest.json`);
