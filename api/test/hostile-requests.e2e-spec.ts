import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { existsSync, mkdirSync, mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { v7 as uuidv7 } from 'uuid';
import { ApiProcess } from './api-process.js';
import { fillPath, type Route, routesOf } from './app-routes.js';
import { bearer, createUpload, noisyJpeg, sha256, upload } from './photo-helpers.js';
import { DeviceMirror, mutation, push, type Session } from './sync-helpers.js';
import { badAnswer, createTestApp, signIn, type TestApp } from './test-app.js';

/**
 * Requests no phone or desk would send: bodies too large or too deep, the wrong content type or encoding, JSON that
 * is not JSON, and path traversal in every path parameter and file name. Each must get a 4xx in Nest's error
 * body, and nothing outside the app's own files may be read, written or removed.
 */
const TRAVERSALS = [
  '../../../../etc/passwd', '..%2f..%2f..%2fetc%2fpasswd', '%2e%2e%2f%2e%2e%2ftest.sqlite', '%252e%252e%252ftest.sqlite', '..%5c..%5ctest.sqlite',
  '....//....//test.sqlite', '%2e%2e', '..', '.', '%00', 'a%00.pdf', '%c0%ae%c0%ae%2f', '..%c0%af', encodeURIComponent('/etc/passwd'), 'x'.repeat(5000),
];

describe('hostile requests', () => {
  let t: TestApp;
  let routes: Route[];
  let tech1: Session;
  let office: Session;
  const web = mkdtempSync(join(tmpdir(), 'wiretrail-web-'));
  const tokenFor = (r: Route) => (r.isPublic ? null : r.roles!.includes('admin') ? admin.accessToken : r.roles!.includes('technician') ? tech1.accessToken : office.accessToken);
  let admin: Session;

  beforeAll(async () => {
    // A web app to serve, with a file beside it that must never be served.
    mkdirSync(join(web, 'dist'));
    writeFileSync(join(web, 'dist', 'index.html'), '<!doctype html><title>Wiretrail</title>');
    writeFileSync(join(web, 'private.txt'), 'not for the web');
    t = await createTestApp({ SHARE_RATE_LIMIT: '100000' });
    await new Promise<void>((resolve) => t.app.getHttpServer().listen(0, '127.0.0.1', resolve));
    routes = routesOf(t);
    [admin, office, tech1] = await Promise.all(['admin@larkfield.example', 'office@larkfield.example', 'tech1@larkfield.example'].map((e) => signIn(t, e)));
  });
  afterAll(async () => {
    await t.close();
    rmSync(web, { recursive: true, force: true });
  });

  /** Sends bytes exactly as given, with the headers given: nothing is encoded, normalised or completed. */
  function raw(method: string, path: string, headers: Record<string, string>, body?: Buffer | string): Promise<{ status: number; text: string; body: unknown }> {
    const { port } = t.app.getHttpServer().address() as AddressInfo;
    return new Promise((resolve, reject) => {
      // Node's client frames a DELETE body with neither length nor chunks unless told its length.
      const framed = body === undefined || headers['content-length'] || headers['transfer-encoding'] ? headers : { ...headers, 'content-length': String(Buffer.byteLength(body)) };
      const req = http.request({ host: '127.0.0.1', port, method, path, headers: framed, agent: false }, (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => {
          const text = Buffer.concat(chunks).toString('utf8');
          let parsed: unknown;
          try {
            parsed = JSON.parse(text);
          } catch {
            parsed = undefined;
          }
          resolve({ status: res.statusCode!, text, body: parsed });
        });
      });
      req.on('error', reject);
      req.end(body);
    });
  }

  const refusedWithMessage = (res: { status: number; text: string; body: unknown }, status?: number) => {
    expect(badAnswer(res)).toBeNull();
    if (status) expect(res.status).toBe(status);
    else expect(res.status).toBeGreaterThanOrEqual(400);
  };

  describe('bodies', () => {
    it('refuses a body over the limit with 413 and a message, on sync and on an office route', async () => {
      const big = JSON.stringify({ deviceId: 'big-phone', mutations: [{ text: 'x'.repeat(6 * 1024 * 1024) }] });
      for (const path of ['/api/sync/push', '/api/jobs']) {
        const res = await raw('POST', path, { ...bearer(office), 'content-type': 'application/json' }, big);
        refusedWithMessage(res, 413);
        expect(res.body).toMatchObject({ message: 'The request body is too large.', error: 'Payload Too Large' });
      }
      const form = await raw('POST', '/api/jobs', { ...bearer(office), 'content-type': 'application/x-www-form-urlencoded' }, `title=${'x'.repeat(200_000)}`);
      refusedWithMessage(form, 413);
    });

    it('answers JSON nested thousands deep with a 4xx, not a stack overflow', async () => {
      for (const depth of [1_000, 10_000, 100_000, 1_000_000]) {
        const nested = `${'['.repeat(depth)}${']'.repeat(depth)}`;
        const objects = `${'{"a":'.repeat(depth)}null${'}'.repeat(depth)}`;
        for (const [path, body] of [
          ['/api/sync/push', `{"deviceId":"deep-phone","mutations":${nested}}`],
          ['/api/sync/push', `{"deviceId":"deep-phone","mutations":[{"mutationId":"${uuidv7()}","entity":"note","id":"${uuidv7()}","baseVersion":0,"hlc":"2026-12-02T10:00:00.000Z-0000-deep","set":${objects}}]}`],
          ['/api/jobs', `{"title":${nested}}`],
          ['/api/blobs/missing', objects],
        ] as const) {
          const res = await raw('POST', path, { ...bearer(office), 'content-type': 'application/json' }, body);
          if (res.status === 200) {
            // Taken as a batch: each mutation answered on its own (a deep value where a field's value goes is refused).
            expect((res.body as { results: Array<{ status: string }> }).results.every((r) => r.status === 'rejected')).toBe(true);
          } else {
            refusedWithMessage(res);
          }
        }
      }
    }, 120_000);

    it.each([
      ['text/plain', '{"title":"Socket"}'],
      ['application/xml', '<job><title>Socket</title></job>'],
      ['multipart/form-data; boundary=x', '--x\r\nContent-Disposition: form-data; name="title"\r\n\r\nSocket\r\n--x--\r\n'],
      ['application/json; charset=latin1', '{"title":"Socket"}'],
      ['application/json; charset=utf-16', '{"title":"Socket"}'],
      ['application/octet-stream', Buffer.from([0, 1, 2, 255])],
      ['', '{"title":"Socket"}'],
      ['application/json, text/plain', '{"title":"Socket"}'],
    ])('refuses a body sent as %j with a 4xx and a message', async (type, body) => {
      const headers: Record<string, string> = { ...bearer(office) };
      if (type) headers['content-type'] = type;
      refusedWithMessage(await raw('POST', '/api/jobs', headers, body));
      refusedWithMessage(await raw('POST', '/api/sync/push', { ...headers }, body));
    });

    it.each([
      ['gzip that is not gzip', { 'content-encoding': 'gzip' }, '{"deviceId":"zip-phone","mutations":[]}'],
      ['an encoding nobody speaks', { 'content-encoding': 'compress' }, '{"deviceId":"zip-phone","mutations":[]}'],
      ['gzip that expands past the limit', { 'content-encoding': 'gzip' }, gzipSync(Buffer.from(JSON.stringify({ deviceId: 'zip-phone', mutations: [], pad: 'x'.repeat(8 * 1024 * 1024) })))],
    ])('refuses %s with a 4xx and a message', async (_what, extra, body) => {
      refusedWithMessage(await raw('POST', '/api/sync/push', { ...bearer(office), 'content-type': 'application/json', ...extra }, body));
    });

    it.each([
      '{"deviceId":', '{"deviceId":"a",}', "{'deviceId':'abcd'}", '"just a string"', '42', 'null', 'true', '[]', '{"a":1}{"b":2}', '\ufeff{"deviceId":"bom-phone","mutations":[]}', '{"deviceId":"abcd","mutations":[1,2,]}',
      '{"deviceId":"abcd","mutations":[NaN]}', '\u0000',
    ])('refuses the malformed or unexpected JSON %j with a 4xx and a message', async (body) => {
      const res = await raw('POST', '/api/sync/push', { ...bearer(office), 'content-type': 'application/json' }, body);
      // A byte-order mark before valid JSON is still the push it says.
      if (res.status === 200) expect(body.startsWith('\ufeff')).toBe(true);
      else refusedWithMessage(res);
    });

    it('lets a __proto__ key in a body change nothing', async () => {
      const res = await raw('POST', '/api/sync/push', { ...bearer(office), 'content-type': 'application/json' }, '{"deviceId":"proto-phone","mutations":[],"__proto__":{"polluted":true}}');
      expect([res.status, res.body]).toEqual([200, { results: [] }]);
      expect(({} as { polluted?: boolean }).polluted).toBeUndefined();
      const job = await raw('POST', '/api/jobs', { ...bearer(office), 'content-type': 'application/json' }, '{"__proto__":{"title":"Hidden"},"constructor":{"prototype":{"polluted":true}}}');
      refusedWithMessage(job, 400);
      expect(({} as { polluted?: boolean }).polluted).toBeUndefined();
    });

    it('refuses the NUL character in a body, a query or a key with the field named, and in a mutation alone', async () => {
      for (const [method, path, body] of [
        ['POST', '/api/customers', '{"name":"Ada\\u0000Lovelace"}'],
        ['POST', '/api/customers', '{"name":"Ada","\\u0000":"x"}'],
        ['GET', '/api/customers?search=%00', undefined],
        ['GET', '/api/jobs?search=a%00b', undefined],
      ] as const) {
        const res = await raw(method, path, { ...bearer(office), 'content-type': 'application/json' }, body);
        refusedWithMessage(res, 400);
        expect(JSON.stringify(res.body)).toContain('must not contain the NUL character');
      }
      const named = await raw('POST', '/api/customers', { ...bearer(office), 'content-type': 'application/json' }, '{"name":"Ada\\u0000Lovelace"}');
      expect(named.body).toMatchObject({ message: ['name must not contain the NUL character (U+0000)'] });
      // In a push, the mutation carrying it is refused and the one beside it still applies.
      const good = mutation('customer', uuidv7(), { name: 'Orchard Rise lettings' });
      const bad = mutation('customer', uuidv7(), { name: 'Null\u0000 Ltd' });
      const results = await push(t, office, 'nul-phone', [bad, good, { ...mutation('customer', uuidv7(), { name: 'x' }), mutationId: 'nul\u0000-mutation-id' }]);
      expect(results.map((r) => r.status)).toEqual(['rejected', 'applied', 'rejected']);
      expect(results[0]!.error).toBe('customer.name must not contain the NUL character (U+0000)');
    });
  });

  describe('path traversal', () => {
    it('answers every traversal in every path parameter with a 4xx in Nest’s error body', async () => {
      const failures: string[] = [];
      let tried = 0;
      for (const r of routes.filter((x) => x.params.length > 0)) {
        for (const evil of TRAVERSALS) {
          for (const at of r.params.keys()) {
            const values = r.params.map((_, i) => (i === at ? evil : uuidv7()));
            const token = tokenFor(r);
            const res = await raw(r.method.toUpperCase(), fillPath(r.path, values), { ...(token ? { authorization: `Bearer ${token}` } : {}), 'content-type': 'application/json' }, r.method === 'get' ? undefined : '{}');
            tried++;
            const wrong = badAnswer(res) ?? (res.status < 400 ? `answered ${res.status}` : null);
            if (wrong) failures.push(`${r.method} ${fillPath(r.path, values)} → ${wrong}`);
          }
        }
      }
      expect(failures).toEqual([]);
      expect(tried).toBeGreaterThan(500);
      console.log(`hostile requests: ${tried} traversal requests on ${routes.filter((x) => x.params.length > 0).length} routes with path parameters; 5xx found: 0`);
    });

    it('takes a photo whose upload names a file outside the upload area, and stores it under its hash only', async () => {
      const bytes = await noisyJpeg(200, 150);
      const before = readdirSync(t.directory).sort();
      const res = await t.http
        .post('/api/uploads')
        .set(bearer(tech1))
        .set('Tus-Resumable', '1.0.0')
        .set('Upload-Length', String(bytes.length))
        .set('Upload-Metadata', `sha256 ${Buffer.from(sha256(bytes)).toString('base64')},filename ${Buffer.from('../../test.sqlite').toString('base64')},filetype ${Buffer.from('../../../etc/passwd').toString('base64')}`);
      expect(res.status).toBe(201);
      expect(res.headers.location).toMatch(/^\/api\/uploads\/[0-9a-f]{32}$/);
      expect((await upload(t, tech1, bytes, { from: { location: res.headers.location as string, offset: 0 } })).last.status).toBe(204);
      expect(readdirSync(t.directory).sort()).toEqual(before);
      expect(existsSync(join(t.directory, 'photos', tech1.user.organisationId, sha256(bytes), 'original'))).toBe(true);
      const refusedHash = await createUpload(t, tech1, 10, { sha256: '../../../../etc/passwd' });
      expect(refusedHash.status).toBe(400);
    });

    it('never reads, changes or removes a file through an upload address', async () => {
      // The addresses below aim at this file beside the upload area: the SQLite database, or a stand-in on PostgreSQL.
      const db = join(t.directory, 'test.sqlite');
      if (!existsSync(db)) writeFileSync(db, 'a file outside the upload area');
      for (const evil of TRAVERSALS) {
        for (const method of ['HEAD', 'PATCH', 'DELETE', 'GET', 'POST']) {
          const res = await raw(method, `/api/uploads/${evil}`, { ...bearer(tech1), 'tus-resumable': '1.0.0', 'upload-offset': '0', 'content-type': 'application/offset+octet-stream', 'upload-length': '4' }, method === 'PATCH' ? 'evil' : undefined);
          expect([method, evil, res.status >= 400 && res.status < 500]).toEqual([method, evil, true]);
        }
      }
      expect(existsSync(db)).toBe(true);
      await t.http.get('/api/health').expect(200);
    });

    it("answers a share token, document or photo id that walks out of its folder with 404 or 400 and no data", async () => {
      const job = new DeviceMirror('hostile-office');
      await job.pullAll(t, office);
      const done = job.one('job', (r) => r.reference === 'LED-0033');
      const link = await t.http.post(`/api/jobs/${done.id}/share-links`).set(bearer(office)).send({}).expect(201);
      const token = link.body.token as string;
      for (const evil of TRAVERSALS) {
        for (const path of [`/api/shared/${token}/documents/${evil}/pdf`, `/api/shared/${token}/photos/${evil}/thumb`, `/api/shared/${evil}`, `/api/shared/${token}${evil}`, `/api/documents/${evil}/pdf`, `/api/photos/${evil}/original`]) {
          const res = await raw('GET', path, {});
          expect([path, res.status >= 400 && res.status < 500]).toEqual([path, true]);
          expect(res.text).not.toContain('SQLite format');
        }
      }
    });
  });

  describe('the web app the built server serves', () => {
    let api: ApiProcess;
    beforeAll(async () => {
      api = await ApiProcess.create({ WEB_DIST: join(web, 'dist') });
      api.prepare();
      await api.start();
    });
    afterAll(() => api.remove());

    it('never serves a file from outside it, however the path is spelled', async () => {
      for (const evil of ['/../private.txt', '/..%2fprivate.txt', '/%2e%2e/private.txt', '/%2e%2e%2fprivate.txt', '/..%5cprivate.txt', '/assets/../../private.txt', '/assets/..%2f..%2fprivate.txt', '/%252e%252e%252fprivate.txt', '//private.txt', '/index.html/..%2f..%2fprivate.txt']) {
        const res = await api.request('GET', evil);
        expect([evil, res.text]).toEqual([evil, expect.not.stringContaining('not for the web')]);
      }
      expect((await api.request('GET', '/')).text).toContain('<title>Wiretrail</title>');
    });
  });

  describe('regressions found by fuzzing', () => {
    it('refuses a null, a number, a list or a string in place of a mutation, alone, and applies the rest of the batch', async () => {
      const view = new DeviceMirror('regress-look');
      await view.pullAll(t, tech1);
      const visit = view.one('visit', (r) => r.jobId === view.one('job', (j) => j.title === 'Move two lounge sockets and add a fused spur for an electric fire').id);
      const note = mutation('note', uuidv7(), { visitId: visit.id, siteId: visit.siteId as string, text: 'After the odd ones' }, { deviceId: 'regress-phone' });
      const results = await push(t, tech1, 'regress-phone', [null, 7, [], 'note', note] as never);
      expect(results.map((r) => r.status)).toEqual(['rejected', 'rejected', 'rejected', 'rejected', 'applied']);
      expect(results[0]!.error).toMatch(/A mutation must be an object/);
    });

    it.each(['/api/jobs', '/api/customers', '/api/conflicts', '/api/users'])('refuses a page too far to count on %s with 400 and a message', async (path) => {
      const res = await t.http.get(`${path}?page=1e%2B308`).set(bearer(admin));
      refusedWithMessage(res, 400);
      expect(res.body.message).toEqual(['page must be at most 1000000']);
    });

    it.each([
      ['users', { role: null }, 'role cannot be emptied'],
      ['users', { name: null, active: null }, 'name cannot be emptied'],
      ['organisations', { name: null }, 'name cannot be emptied'],
      ['organisations', { keepPhotoLocation: null }, 'keepPhotoLocation cannot be emptied'],
    ])('refuses null for a field of %s that cannot be emptied (%j) with 400 and a message', async (what, body, message) => {
      const id = what === 'users' ? tech1.user.id : admin.user.organisationId;
      const res = await t.http.patch(`/api/${what}/${id}`).set(bearer(admin)).send(body);
      refusedWithMessage(res, 400);
      expect(res.body.message).toContain(message);
    });

    it('queues a password link while the mail server is down, instead of failing the request', async () => {
      // This app has no mail server to reach.
      const res = await t.http.post(`/api/users/${tech1.user.id}/password-reset`).set(bearer(admin)).expect(202);
      expect(res.body.sentTo).toBe('tech1@larkfield.example');
      const queued = await t.dataSource.query(`SELECT "toAddress", "state" FROM "outgoing_mail" WHERE "purpose" = 'password-reset'`);
      expect(queued).toEqual([{ toAddress: 'tech1@larkfield.example', state: 'queued' }]);
    });
  });
});
