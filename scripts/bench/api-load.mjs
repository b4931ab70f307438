// API under load: 100 concurrent connections on the visit list and on push, with autocannon.
import autocannon from 'autocannon';
import { v7 as uuidv7 } from 'uuid';
import { signIn, startApi } from './harness.mjs';

function run(opts) {
  return new Promise((resolve, reject) => autocannon(opts, (err, res) => (err ? reject(err) : resolve(res))));
}

export async function benchApiLoad({ port = 3604, seconds = 10 } = {}) {
  const api = await startApi({ port });
  try {
    const office = await signIn(api.base, 'office@larkfield.example');
    const headers = { authorization: `Bearer ${office.accessToken}`, 'content-type': 'application/json' };
    const pulled = await (await fetch(`${api.base}/api/sync/pull?checkpoint=0&limit=1000&deviceId=load-office`, { headers })).json();
    const visit = pulled.changes.find((c) => c.entity === 'visit').row;

    const list = await run({ url: `${api.base}/api/visits?pageSize=50`, connections: 100, duration: seconds, headers });
    let n = 0;
    const push = await run({
      url: `${api.base}/api/sync/push`,
      method: 'POST',
      connections: 100,
      duration: seconds,
      headers,
      requests: [
        {
          setupRequest: (req) => ({
            ...req,
            body: JSON.stringify({
              deviceId: `load${n % 100}`,
              mutations: [{ mutationId: uuidv7(), entity: 'note', id: uuidv7(), baseVersion: 0, set: { visitId: visit.id, siteId: visit.siteId, text: `load ${n++}` }, hlc: `${new Date().toISOString()}-0000-load${n % 100}` }],
            }),
          }),
        },
      ],
    });
    const peak = api.peakMemoryMb();
    const row = (name, r) => ({
      name,
      measuredMs: r.requests.average,
      display: `${Math.round(r.requests.average)} req/s, p50 ${r.latency.p50} ms, p99 ${r.latency.p99} ms, errors ${r.errors} (timeouts ${r.timeouts}), non-2xx ${r.non2xx}`,
      targetDisplay: 'no errors',
      ok: r.errors + r.non2xx === 0,
    });
    return [
      row('api load: GET /api/visits, 100 connections', list),
      row('api load: POST /api/sync/push, 100 connections', push),
      { name: 'api load: peak memory of the API process', measuredMs: peak, display: `${peak.toFixed(0)} MB` },
    ];
  } finally {
    await api.stop();
  }
}
