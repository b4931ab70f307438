import { describe, expect, it } from '@jest/globals';
import express from 'express';
import request from 'supertest';
import { requestOrigin } from './request-origin.js';

/** An Express app that answers with the origin it reads, trusting the proxies named as TRUST_PROXY would. */
function appTrusting(trust?: string | boolean) {
  const app = express();
  if (trust !== undefined) app.set('trust proxy', trust);
  app.get('/', (req, res) => res.json({ origin: requestOrigin(req) }));
  return app;
}

describe('requestOrigin', () => {
  it('is the Host the request came to, and reads no forwarded header when no proxy is trusted', async () => {
    const res = await request(appTrusting()).get('/').set('host', 'wiretrail.example:8443').set('x-forwarded-host', 'elsewhere.example').set('x-forwarded-proto', 'https');
    expect(res.body).toEqual({ origin: 'http://wiretrail.example:8443' });
  });

  it('takes the scheme and host a trusted proxy forwards', async () => {
    const res = await request(appTrusting('loopback')).get('/').set('host', '127.0.0.1:3000').set('x-forwarded-host', 'jobs.larkfield.example').set('x-forwarded-proto', 'https');
    expect(res.body).toEqual({ origin: 'https://jobs.larkfield.example' });
  });

  it('ignores what a proxy TRUST_PROXY does not name forwards', async () => {
    const res = await request(appTrusting('10.0.0.0/8')).get('/').set('host', 'wiretrail.example').set('x-forwarded-host', 'elsewhere.example').set('x-forwarded-proto', 'https');
    expect(res.body).toEqual({ origin: 'http://wiretrail.example' });
  });

  it('gives nothing for a host no browser could have used', async () => {
    const res = await request(appTrusting('loopback')).get('/').set('x-forwarded-host', 'evil.example/path?x=<b>');
    expect(res.body).toEqual({ origin: null });
  });
});
