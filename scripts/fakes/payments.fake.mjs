// A local stand-in for the payment provider's API, enough for Checkout: the official `stripe` SDK talks to it
// (host/port/protocol options), it serves a hosted "pay" page, and on payment it delivers a signed
// `checkout.session.completed` webhook exactly as the provider documents the Stripe-Signature header
// (t=<unix time>,v1=<HMAC-SHA256 of "t.payload" with the endpoint secret>). Sessions can be retrieved and
// expired (POST /v1/checkout/sessions/:id/expire, open sessions only) and lapse after 24 hours, as the
// provider documents them. No money moves.
import { createHmac, randomBytes } from 'node:crypto';
import { createServer } from 'node:http';

export async function start({ port }) {
  const secretKey = `sk_test_local_${randomBytes(12).toString('hex')}`;
  const webhookSecret = `whsec_local_${randomBytes(16).toString('hex')}`;
  const sessions = new Map();
  const deliveries = [];

  const server = createServer(async (request, response) => {
    const url = new URL(request.url ?? '/', `http://127.0.0.1:${port}`);
    const body = await readBody(request);
    const json = (status, value) => {
      response.writeHead(status, {
        'content-type': 'application/json',
        'request-id': `req_${randomBytes(6).toString('hex')}`,
      });
      response.end(JSON.stringify(value));
    };
    const apiError = (status, message) => json(status, { error: { type: 'invalid_request_error', message } });

    // The API: the SDK authenticates with the secret key as a Bearer token, bodies are form-encoded.
    if (url.pathname.startsWith('/v1/')) {
      if (request.headers.authorization !== `Bearer ${secretKey}`) return apiError(401, 'Invalid API Key provided.');
      if (request.method === 'POST' && url.pathname === '/v1/checkout/sessions') {
        const params = parseForm(body);
        const lines = Object.values(params.line_items ?? {});
        if (!lines.length || !params.success_url) return apiError(400, 'line_items and success_url are required.');
        const amountTotal = lines.reduce(
          (sum, line) => sum + Number(line.price_data?.unit_amount ?? 0) * Number(line.quantity ?? 1),
          0,
        );
        const id = `cs_test_${randomBytes(12).toString('hex')}`;
        const session = {
          id,
          object: 'checkout.session',
          mode: params.mode ?? 'payment',
          status: 'open',
          payment_status: 'unpaid',
          amount_total: amountTotal,
          currency: lines[0].price_data?.currency ?? 'usd',
          metadata: params.metadata ?? {},
          client_reference_id: params.client_reference_id ?? null,
          customer_email: params.customer_email ?? null,
          success_url: params.success_url,
          cancel_url: params.cancel_url ?? null,
          url: `http://127.0.0.1:${port}/pay/${id}`,
          created: Math.floor(Date.now() / 1000),
          expires_at: Math.floor(Date.now() / 1000) + 86_400,
          livemode: false,
        };
        sessions.set(id, session);
        return json(200, session);
      }
      const found = url.pathname.match(/^\/v1\/checkout\/sessions\/([\w]+)$/);
      if (request.method === 'GET' && found)
        return sessions.has(found[1])
          ? json(200, lapse(sessions.get(found[1])))
          : apiError(404, `No such checkout.session: '${found[1]}'`);
      const expire = url.pathname.match(/^\/v1\/checkout\/sessions\/([\w]+)\/expire$/);
      if (request.method === 'POST' && expire) {
        const session = sessions.get(expire[1]);
        if (!session) return apiError(404, `No such checkout.session: '${expire[1]}'`);
        if (lapse(session).status !== 'open')
          return apiError(400, `Only an open checkout session can be expired; this one is ${session.status}.`);
        Object.assign(session, { status: 'expired', url: null });
        return json(200, session);
      }
      return apiError(404, `Unrecognized request URL (${request.method}: ${url.pathname}).`);
    }

    // The hosted page the customer is sent to.
    const page = url.pathname.match(/^\/pay\/([\w]+)$/);
    if (page) {
      const session = sessions.get(page[1]);
      if (!session) {
        response.writeHead(404, { 'content-type': 'text/plain' });
        return response.end('No such payment');
      }
      if (lapse(session).status === 'expired') {
        response.writeHead(410, { 'content-type': 'text/plain' });
        return response.end('This payment page has expired.');
      }
      if (request.method === 'POST') {
        if (session.payment_status !== 'paid') {
          Object.assign(session, { status: 'complete', payment_status: 'paid' });
          await deliver(session);
        }
        response.writeHead(303, { location: session.success_url.replace('{CHECKOUT_SESSION_ID}', session.id) });
        return response.end();
      }
      const amount = new Intl.NumberFormat('en-US', {
        style: 'currency',
        currency: session.currency.toUpperCase(),
      }).format(session.amount_total / 100);
      response.writeHead(200, { 'content-type': 'text/html; charset=utf-8' });
      return response.end(`<!doctype html><meta charset="utf-8"><meta name="viewport" content="width=device-width"><title>Test payment</title>
<style>body{font:16px system-ui;max-width:28rem;margin:3rem auto;padding:0 1rem}button{font:inherit;padding:.75rem 1.5rem;background:#115e59;color:#fff;border:0;border-radius:.5rem}</style>
<h1>Local test payment</h1><p>This page stands in for the payment provider in development and tests. No money moves.</p>
<p>Amount due: <strong data-testid="amount">${amount}</strong></p>
<form method="post"><button type="submit">Pay ${amount}</button></form>
${session.cancel_url ? `<p><a href="${escapeHtml(session.cancel_url)}">Cancel</a></p>` : ''}`);
    }
    if (url.pathname === '/deliveries') return json(200, deliveries);
    response.writeHead(404, { 'content-type': 'text/plain' });
    response.end('Not found');
  });

  // An open session past its expiry reads as expired, like the provider's.
  function lapse(session) {
    if (session.status === 'open' && session.expires_at <= Math.floor(Date.now() / 1000))
      Object.assign(session, { status: 'expired', url: null });
    return session;
  }

  // Where the provider would be told (in its dashboard) to send events: here, the app that made the session.
  async function deliver(session) {
    const event = {
      id: `evt_${randomBytes(12).toString('hex')}`,
      object: 'event',
      type: 'checkout.session.completed',
      created: Math.floor(Date.now() / 1000),
      livemode: false,
      data: { object: session },
    };
    const payload = JSON.stringify(event);
    const timestamp = Math.floor(Date.now() / 1000);
    const signature = createHmac('sha256', webhookSecret).update(`${timestamp}.${payload}`).digest('hex');
    const target = new URL('/api/payments/webhook', session.success_url).href;
    for (let attempt = 1; attempt <= 3; attempt += 1) {
      try {
        const answer = await fetch(target, {
          method: 'POST',
          headers: { 'content-type': 'application/json', 'stripe-signature': `t=${timestamp},v1=${signature}` },
          body: payload,
        });
        deliveries.push({ event: event.id, target, status: answer.status, attempt });
        if (answer.ok) return;
      } catch (error) {
        deliveries.push({ event: event.id, target, error: String(error), attempt });
      }
      await new Promise((resolve) => setTimeout(resolve, 300 * attempt));
    }
  }

  await new Promise((resolve) => server.listen(port, '127.0.0.1', resolve));
  return {
    name: 'payments',
    env: {
      STRIPE_SECRET_KEY: secretKey,
      STRIPE_WEBHOOK_SECRET: webhookSecret,
      STRIPE_API_URL: `http://127.0.0.1:${port}`,
    },
    stop: () => new Promise((resolve) => server.close(resolve)),
  };
}

function readBody(request) {
  return new Promise((resolve) => {
    const chunks = [];
    request.on('data', (chunk) => chunks.push(chunk));
    request.on('end', () => resolve(Buffer.concat(chunks).toString('utf8')));
  });
}

/** a[b][0][c]=1 form keys into nested objects (arrays kept as index-keyed objects). */
function parseForm(text) {
  const out = {};
  for (const [key, value] of new URLSearchParams(text)) {
    const parts = key.replace(/\]/g, '').split('[');
    let node = out;
    parts.forEach((part, index) => {
      if (index === parts.length - 1) node[part] = value;
      else node = node[part] ??= {};
    });
  }
  return out;
}

const escapeHtml = (value) => String(value).replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
