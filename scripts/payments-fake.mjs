#!/usr/bin/env node
// Local stand-in for the card payment provider. It answers the few API calls Wiretrail makes through the
// provider's official Node SDK (create, read and expire a hosted checkout session, refund a payment), in the shapes
// the provider documents, shows a plain checkout page of its own, and on payment sends the signed
// `checkout.session.completed` webhook. An expired session takes no payment, whether it was expired through the API
// or its `expires_at` has passed (then `checkout.session.expired` is sent, as the provider does). Pointing the SDK at the real provider is a configuration change (PAYMENTS_API_URL unset).
import { createHmac, randomBytes } from 'node:crypto';
import { createServer } from 'node:http';
import { pathToFileURL } from 'node:url';

/** A card number that the fake declines; any other well-formed number pays. */
export const DECLINED_CARD = '4000000000000002';

const id = (prefix) => `${prefix}_${randomBytes(12).toString('hex')}`;

/** Form bodies as the SDK sends them: `line_items[0][price_data][unit_amount]=1250` into nested objects and arrays. */
export function parseForm(body) {
  const out = {};
  for (const [key, value] of new URLSearchParams(body)) {
    const path = key.replace(/\]/g, '').split('[');
    let node = out;
    path.forEach((part, i) => {
      const last = i === path.length - 1;
      const nextIsIndex = !last && /^\d+$/.test(path[i + 1]);
      if (last) node[part] = value;
      else node = node[part] ??= nextIsIndex ? [] : {};
    });
  }
  return out;
}

/** The provider's webhook signature: HMAC-SHA256 of "<timestamp>.<payload>" with the endpoint's secret. */
export function signPayload(payload, secret, timestamp = Math.floor(Date.now() / 1000)) {
  const v1 = createHmac('sha256', secret).update(`${timestamp}.${payload}`, 'utf8').digest('hex');
  return `t=${timestamp},v1=${v1}`;
}

function page(title, body) {
  return `<!doctype html><html lang="en-GB"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${title}</title><style>
body{font-family:system-ui,sans-serif;background:#eef1f1;color:#14262b;margin:0;display:grid;place-items:center;min-height:100vh}
main{background:#fff;border-radius:12px;padding:28px;max-width:380px;width:calc(100% - 32px);box-shadow:0 2px 12px #0002}
h1{font-size:1.3rem;margin:0 0 4px}.amount{font-size:2rem;font-weight:600;margin:12px 0}
label{display:block;font-size:.9rem;margin:14px 0 4px}input{width:100%;box-sizing:border-box;font-size:1.1rem;padding:12px;border:1px solid #7a8a8e;border-radius:8px}
button{margin-top:20px;width:100%;min-height:52px;font-size:1.1rem;border:0;border-radius:8px;background:#2b4f5c;color:#fff}
.note{font-size:.85rem;color:#44585d;margin-top:14px}.error{color:#b3261e}
</style></head><body><main>${body}</main></body></html>`;
}

const pounds = (minor, currency) => new Intl.NumberFormat('en-GB', { style: 'currency', currency: currency.toUpperCase() }).format(minor / 100);
const escape = (s) => String(s ?? '').replace(/[&<>"]/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;' })[c]);

export async function startPaymentsFake({ port = 0, host = '127.0.0.1', webhookUrl, webhookSecret, log = () => undefined } = {}) {
  const sessions = new Map();
  const events = [];
  const refunds = [];
  /** The SDK's Idempotency-Key: a request sent again answers as the first did, and does nothing more. */
  const idempotent = new Map();
  const settings = { refuseRefunds: false };
  let base = '';

  async function deliver(event) {
    if (!webhookUrl) return;
    const payload = JSON.stringify(event);
    for (let attempt = 1; attempt <= 3; attempt++) {
      try {
        const res = await fetch(webhookUrl, { method: 'POST', headers: { 'content-type': 'application/json', 'stripe-signature': signPayload(payload, webhookSecret) }, body: payload });
        event.deliveries.push({ at: new Date().toISOString(), status: res.status });
        if (res.ok) return;
      } catch (err) {
        event.deliveries.push({ at: new Date().toISOString(), error: String(err?.message ?? err) });
      }
      await new Promise((r) => setTimeout(r, 200 * attempt));
    }
  }

  function eventFor(type, session) {
    const event = { id: id('evt'), object: 'event', api_version: '2025-01-01', created: Math.floor(Date.now() / 1000), livemode: false, type, data: { object: { ...session } }, pending_webhooks: 1 };
    Object.defineProperty(event, 'deliveries', { value: [], enumerable: false });
    events.push(event);
    return event;
  }

  function createSession(form) {
    const items = Array.isArray(form.line_items) ? form.line_items : [];
    const currency = (items[0]?.price_data?.currency ?? 'gbp').toLowerCase();
    const amount = items.reduce((sum, li) => sum + Number(li.price_data?.unit_amount ?? 0) * Number(li.quantity ?? 1), 0);
    if (!items.length || !Number.isSafeInteger(amount) || amount <= 0) return { error: { type: 'invalid_request_error', message: 'line_items with a positive price_data[unit_amount] are required.' } };
    if (form.expires_at !== undefined && !(Number(form.expires_at) > Date.now() / 1000)) {
      return { error: { type: 'invalid_request_error', message: 'expires_at must be in the future.', param: 'expires_at' } };
    }
    if (!form.success_url) return { error: { type: 'invalid_request_error', message: 'Missing required param: success_url.', param: 'success_url' } };
    const sid = id('cs_test');
    const session = {
      id: sid,
      object: 'checkout.session',
      mode: form.mode ?? 'payment',
      status: 'open',
      payment_status: 'unpaid',
      amount_total: amount,
      amount_subtotal: amount,
      currency,
      client_reference_id: form.client_reference_id ?? null,
      customer_email: form.customer_email ?? null,
      metadata: form.metadata ?? {},
      success_url: form.success_url,
      cancel_url: form.cancel_url ?? null,
      payment_intent: null,
      created: Math.floor(Date.now() / 1000),
      expires_at: Number(form.expires_at) || Math.floor(Date.now() / 1000) + 24 * 3600,
      amount_refunded: 0,
      livemode: false,
      url: `${base}/checkout/${sid}`,
      line_items_description: items.map((li) => li.price_data?.product_data?.name).filter(Boolean).join(', '),
    };
    sessions.set(sid, session);
    return { session };
  }

  /** A session whose time is up lapses when next looked at, and the provider says so by its event. */
  async function lapseIfDue(session) {
    if (session.status !== 'open' || session.expires_at > Date.now() / 1000) return;
    session.status = 'expired';
    const event = eventFor('checkout.session.expired', session);
    log(`checkout ${session.id} expired; sending ${event.id}`);
    await deliver(event);
  }

  function createRefund(form) {
    const session = [...sessions.values()].find((s) => s.payment_intent && s.payment_intent === form.payment_intent);
    if (!session) return { status: 404, body: { error: { type: 'invalid_request_error', message: `No such payment_intent: '${form.payment_intent ?? ''}'`, code: 'resource_missing', param: 'payment_intent' } } };
    const left = session.amount_total - session.amount_refunded;
    const amount = form.amount === undefined ? left : Number(form.amount);
    if (!Number.isSafeInteger(amount) || amount <= 0 || amount > left) {
      return { status: 400, body: { error: { type: 'invalid_request_error', message: `Refund amount (${form.amount}) is greater than unrefunded amount on charge (${left})`, param: 'amount' } } };
    }
    if (settings.refuseRefunds) return { status: 500, body: { error: { type: 'api_error', message: 'Refunds are not available at the moment.' } } };
    session.amount_refunded += amount;
    const refund = { id: id('re'), object: 'refund', amount, currency: session.currency, payment_intent: session.payment_intent, reason: form.reason ?? null, metadata: form.metadata ?? {}, status: 'succeeded', created: Math.floor(Date.now() / 1000) };
    refunds.push(refund);
    log(`refunded ${amount} of ${session.payment_intent}`);
    return { status: 200, body: refund };
  }

  const json = (res, status, body) => {
    res.writeHead(status, { 'content-type': 'application/json', 'request-id': id('req') });
    res.end(JSON.stringify(body));
  };
  const readBody = (req) =>
    new Promise((resolve, reject) => {
      let data = '';
      req.setEncoding('utf8');
      req.on('data', (c) => {
        data += c;
        if (data.length > 1_000_000) req.destroy();
      });
      req.on('end', () => resolve(data));
      req.on('error', reject);
    });

  const server = createServer(async (req, res) => {
    const url = new URL(req.url ?? '/', base);
    const parts = url.pathname.split('/').filter(Boolean);
    try {
      if (parts[0] === 'v1') {
        if (!/^Bearer sk_(test|live)_/.test(req.headers.authorization ?? '')) {
          return json(res, 401, { error: { type: 'invalid_request_error', message: 'Invalid API Key provided.' } });
        }
        if (req.method === 'POST' && url.pathname === '/v1/refunds') {
          const key = req.headers['idempotency-key'];
          const known = typeof key === 'string' ? idempotent.get(key) : undefined;
          if (known) return json(res, known.status, known.body);
          const made = createRefund(parseForm(await readBody(req)));
          if (typeof key === 'string' && made.status < 500) idempotent.set(key, made);
          return json(res, made.status, made.body);
        }
        if (req.method === 'POST' && url.pathname === '/v1/checkout/sessions') {
          const made = createSession(parseForm(await readBody(req)));
          return made.error ? json(res, 400, { error: made.error }) : json(res, 200, made.session);
        }
        const session = parts[1] === 'checkout' && parts[2] === 'sessions' ? sessions.get(parts[3]) : undefined;
        if (!session) return json(res, 404, { error: { type: 'invalid_request_error', message: `No such checkout.session: '${parts[3] ?? ''}'`, code: 'resource_missing' } });
        await lapseIfDue(session);
        if (req.method === 'GET' && parts.length === 4) return json(res, 200, session);
        if (req.method === 'POST' && parts[4] === 'expire') {
          if (session.status !== 'open') return json(res, 400, { error: { type: 'invalid_request_error', message: `Only Checkout Sessions with a status in ["open"] can be expired.` } });
          session.status = 'expired';
          return json(res, 200, session);
        }
        return json(res, 404, { error: { type: 'invalid_request_error', message: 'Unrecognized request URL.' } });
      }
      if (parts[0] === 'checkout' && parts[1]) {
        const session = sessions.get(parts[1]);
        if (!session) return res.writeHead(404, { 'content-type': 'text/html' }).end(page('Not found', '<h1>This payment page does not exist.</h1>'));
        await lapseIfDue(session);
        if (session.status !== 'open') {
          return res.writeHead(200, { 'content-type': 'text/html' }).end(page('Closed', `<h1>This payment is ${session.status === 'complete' ? 'already made' : 'no longer open'}.</h1>`));
        }
        if (req.method === 'GET') {
          return res.writeHead(200, { 'content-type': 'text/html' }).end(
            page(
              'Card payment (test)',
              `<h1>Pay by card</h1><div>${escape(session.line_items_description)}</div><div class="amount">${pounds(session.amount_total, session.currency)}</div>
<form method="post" action="/checkout/${session.id}/pay"><label for="card">Card number</label><input id="card" name="card" inputmode="numeric" autocomplete="cc-number" value="4242 4242 4242 4242">
<label for="expiry">Expiry (MM/YY)</label><input id="expiry" name="expiry" value="12/30"><label for="cvc">Security code</label><input id="cvc" name="cvc" value="123">
<button type="submit">Pay ${pounds(session.amount_total, session.currency)}</button></form>
<p class="note">A local stand-in for the payment provider: no card is charged. ${DECLINED_CARD} is declined.</p>`,
            ),
          );
        }
        if (req.method === 'POST' && parts[2] === 'pay') {
          const form = new URLSearchParams(await readBody(req));
          const card = (form.get('card') ?? '').replace(/\s/g, '');
          if (!/^\d{12,19}$/.test(card) || card === DECLINED_CARD) {
            return res.writeHead(402, { 'content-type': 'text/html' }).end(page('Declined', `<h1 class="error">The card was declined.</h1><p><a href="/checkout/${session.id}">Try another card</a></p>`));
          }
          session.status = 'complete';
          session.payment_status = 'paid';
          session.payment_intent = id('pi');
          const event = eventFor('checkout.session.completed', session);
          log(`payment ${session.id} completed; sending ${event.id}`);
          await deliver(event);
          res.writeHead(303, { location: session.success_url.replace('{CHECKOUT_SESSION_ID}', session.id) }).end();
          return;
        }
      }
      if (parts[0] === '_fake' && parts[1] === 'events') {
        if (req.method === 'GET') return json(res, 200, events.map((e) => ({ ...e, deliveries: e.deliveries })));
        const event = events.find((e) => e.id === parts[2]);
        if (req.method === 'POST' && event && parts[3] === 'resend') {
          await deliver(event);
          return json(res, 200, { resent: event.id, deliveries: event.deliveries });
        }
      }
      json(res, 404, { error: { type: 'invalid_request_error', message: 'Unrecognized request URL.' } });
    } catch (err) {
      json(res, 500, { error: { type: 'api_error', message: String(err?.message ?? err) } });
    }
  });

  await new Promise((resolve) => server.listen(port, host, resolve));
  const address = server.address();
  base = `http://${host}:${address.port}`;
  return {
    url: base,
    port: address.port,
    sessions,
    events,
    refunds,
    /** Makes the provider refuse refunds (500) until set back, as when it is down. */
    refuseRefunds: (refuse = true) => {
      settings.refuseRefunds = refuse;
    },
    /** Where events go: a test may learn the API's address only after the fake has started. */
    setWebhookUrl: (url) => {
      webhookUrl = url;
    },
    /** Pays a session as the customer would on the page, for tests without a browser. */
    pay: async (sessionId, card = '4242424242424242') =>
      fetch(`${base}/checkout/${sessionId}/pay`, { method: 'POST', body: new URLSearchParams({ card }), redirect: 'manual' }),
    close: () => new Promise((resolve) => server.close(() => resolve(undefined))),
  };
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  const fake = await startPaymentsFake({
    port: Number(process.env.PAYMENTS_FAKE_PORT ?? 12111),
    webhookUrl: process.env.PAYMENTS_WEBHOOK_URL,
    webhookSecret: process.env.PAYMENTS_WEBHOOK_SECRET ?? 'whsec_local_fake',
    log: (line) => console.log(`Payments fake: ${line}`),
  });
  console.log(`Payments fake: provider API and checkout pages at ${fake.url}`);
  const stop = () => fake.close().then(() => process.exit(0));
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}
