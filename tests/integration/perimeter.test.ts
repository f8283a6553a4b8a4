import { randomBytes } from 'node:crypto';
import { NextRequest } from 'next/server';
import { beforeEach, describe, expect, it } from 'vitest';
import { POST as createCustomerRoute } from '@/app/api/customers/route';
import nodemailer from 'nodemailer';
import { env } from '@/lib/env';
import { transportOptions } from '@/lib/report/deliver';
import { Customer } from '@/models';
import { proxy } from '@/proxy';
import { LIMITS, recordSignInFailure, recordSignInSuccess, signInLockedFor } from '@/lib/security/throttle';
import { signInAs } from './helpers/session';
import { call, jsonBody } from './helpers/call';
import { makeWorld, type World } from './helpers/world';

// The perimeter: attempt limits in PostgreSQL, the body rules of JSON routes, and what proxy.ts
// answers before a route runs.

const APP = 'http://localhost:3000';
const randomIp = () => `10.${[0, 0, 0].map(() => randomBytes(1)[0]).join('.')}`;

// The HTTP side of sign-in (next-auth's callback behind the limits, the 429 with Retry-After, no
// session) runs against the real server in tests/e2e/perimeter.spec.ts: next-auth reads the request
// scope of a running Next server. Here, the counting itself against the real store.
describe('sign-in attempt counting (PostgreSQL store)', () => {
  const email = () => `someone-${randomBytes(4).toString('hex')}@perimeter.test`;

  it('locks an e-mail at its 10th consecutive failure for 15 minutes, from any address; a success clears it', async () => {
    const who = email();
    for (let i = 1; i <= 9; i += 1) {
      expect(await recordSignInFailure(who, randomIp())).toBeNull();
      expect(await signInLockedFor(who, randomIp())).toBeNull();
    }
    expect(await recordSignInFailure(who.toUpperCase(), randomIp())).toBe(LIMITS.signInEmail.blockDuration);
    const wait = await signInLockedFor(` ${who} `, randomIp());
    expect(wait).toBeGreaterThan(LIMITS.signInEmail.blockDuration - 5);
    expect(wait).toBeLessThanOrEqual(LIMITS.signInEmail.blockDuration);
    expect(await signInLockedFor(email(), randomIp())).toBeNull();

    const other = email();
    for (let i = 1; i <= 9; i += 1) await recordSignInFailure(other, randomIp());
    await recordSignInSuccess(other);
    for (let i = 1; i <= 9; i += 1) expect(await recordSignInFailure(other, randomIp())).toBeNull();
    expect(await signInLockedFor(other, randomIp())).toBeNull();
  });

  it('locks an address at its 100th failure within the hour, whatever the e-mails', async () => {
    const ip = randomIp();
    for (let i = 1; i < LIMITS.signInIp.points; i += 1)
      expect(await recordSignInFailure(i % 2 ? email() : null, ip)).toBeNull();
    const lock = await recordSignInFailure(email(), ip);
    expect(lock).toBeGreaterThan(LIMITS.signInIp.duration - 60);
    expect(await signInLockedFor(email(), ip)).toBeGreaterThan(0);
    expect(await signInLockedFor(email(), randomIp())).toBeNull();
  }, 60_000);
});

describe('the body of a JSON route', () => {
  let w: World;
  beforeEach(async () => {
    w = await makeWorld('Bodies');
    await signInAs(w.office);
  });
  const count = () => Customer.count({ where: { companyId: w.company.id } });
  const customer = { name: 'Harrow Lane Flats', kind: 'property_manager' };

  it('answers 415 to JSON sent as text/plain (what a cross-site form can send) and writes nothing', async () => {
    const before = await count();
    const answer = await call(
      createCustomerRoute,
      '/api/customers',
      {},
      { method: 'POST', headers: { 'content-type': 'text/plain' }, body: JSON.stringify(customer) },
    );
    expect(answer).toEqual({ status: 415, body: { error: { message: 'Send the body as application/json.' } } });
    const form = await call(
      createCustomerRoute,
      '/api/customers',
      {},
      { method: 'POST', headers: { 'content-type': 'application/x-www-form-urlencoded' }, body: 'name=x' },
    );
    expect(form.status).toBe(415);
    expect(await count()).toBe(before);
  });

  it('answers 413 to a 2 MB body, declared or chunked, and writes nothing', async () => {
    const before = await count();
    const big = JSON.stringify({ ...customer, notes: 'x'.repeat(2 * 1024 * 1024) });
    const declared = await call(
      createCustomerRoute,
      '/api/customers',
      {},
      {
        method: 'POST',
        headers: { 'content-type': 'application/json', 'content-length': String(big.length) },
        body: big,
      },
    );
    expect(declared.status).toBe(413);
    // A stream has no Content-Length: the reader counts the bytes and stops at the limit.
    const chunks = [big.slice(0, 700_000), big.slice(700_000, 1_400_000), big.slice(1_400_000)];
    const stream = new ReadableStream({
      pull(controller) {
        const next = chunks.shift();
        if (next === undefined) controller.close();
        else controller.enqueue(new TextEncoder().encode(next));
      },
    });
    const chunked = await call(createCustomerRoute, '/api/customers', {}, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: stream,
      duplex: 'half',
    } as RequestInit);
    expect(chunked).toEqual({ status: 413, body: { error: { message: 'The request body is larger than 1024 KB.' } } });
    expect(await count()).toBe(before);
  });

  it('still creates from a proper JSON body (the control)', async () => {
    const before = await count();
    expect((await call(createCustomerRoute, '/api/customers', {}, jsonBody('POST', customer))).status).toBe(201);
    expect(await count()).toBe(before + 1);
  });
});

describe('proxy.ts', () => {
  const request = (path: string, init: { method?: string; headers?: Record<string, string>; body?: string } = {}) =>
    new NextRequest(`${APP}${path}`, init);
  const passedOn = (response: Response) => response.headers.get('x-middleware-next') === '1';

  it('refuses a cross-site write to the API before any route runs', async () => {
    const foreign = await proxy(
      request('/api/customers', {
        method: 'POST',
        headers: { origin: 'https://evil.example', 'content-type': 'application/json' },
        body: '{}',
      }),
    );
    expect(foreign.status).toBe(403);
    expect(passedOn(foreign)).toBe(false);
    expect(await foreign.json()).toEqual({
      error: { message: 'This request came from another site and was refused.' },
    });
    expect(
      (await proxy(request('/api/customers/x', { method: 'DELETE', headers: { 'sec-fetch-site': 'cross-site' } })))
        .status,
    ).toBe(403);
    expect(passedOn(await proxy(request('/api/customers', { method: 'POST', headers: { origin: APP } })))).toBe(true);
    expect(passedOn(await proxy(request('/api/customers', { method: 'POST' })))).toBe(true);
  });

  it('refuses a declared body over 1 MB with 413, the webhook included', async () => {
    for (const path of ['/api/customers', '/api/payments/webhook', '/api/auth/callback/credentials']) {
      const answer = await proxy(
        request(path, { method: 'POST', headers: { 'content-length': String(2 * 1024 * 1024) } }),
      );
      expect(answer.status).toBe(413);
      expect(passedOn(answer)).toBe(false);
    }
  });

  it('gives pages a nonce CSP (also handed to Next on the request) and every answer the other headers', async () => {
    const page = await proxy(request('/sign-in'));
    expect(passedOn(page)).toBe(true);
    const policy = page.headers.get('content-security-policy') ?? '';
    const nonce = policy.match(/'nonce-([A-Za-z0-9+/=]+)'/)?.[1];
    expect(nonce).toBeTruthy();
    expect(page.headers.get('x-middleware-request-x-nonce')).toBe(nonce);
    expect(page.headers.get('x-middleware-request-content-security-policy')).toBe(policy);
    expect(policy).toMatch(/frame-ancestors 'none'/);
    const again = (await proxy(request('/sign-in'))).headers.get('content-security-policy');
    expect(again).not.toBe(policy);
    for (const answer of [page, await proxy(request('/api/health')), await proxy(request('/r/abc.def'))]) {
      expect(answer.headers.get('x-content-type-options')).toBe('nosniff');
      expect(answer.headers.get('permissions-policy')).toMatch(/^camera=\(self\)/);
      expect(answer.headers.get('content-security-policy')).toMatch(/frame-ancestors 'none'/);
      expect(answer.headers.get('strict-transport-security')).toBeNull();
    }
    expect((await proxy(request('/r/abc.def'))).headers.get('referrer-policy')).toBe('no-referrer');
    expect(page.headers.get('referrer-policy')).toBe('strict-origin-when-cross-origin');
    const https = await proxy(request('/sign-in', { headers: { 'x-forwarded-proto': 'https' } }));
    expect(https.headers.get('strict-transport-security')).toMatch(/^max-age=31536000/);
  });

  it('sends a signed-out visitor of a desk page to /sign-in with the path to return to', async () => {
    const answer = await proxy(request('/jobs?status=scheduled'));
    expect(answer.status).toBe(307);
    expect(answer.headers.get('location')).toBe(`${APP}/sign-in?callbackUrl=%2Fjobs%3Fstatus%3Dscheduled`);
  });

  it('answers 429 with Retry-After to the 61st request a minute from one address to report links (page and PDF)', async () => {
    const ip = randomIp();
    for (let i = 0; i < LIMITS.reportLink.points; i += 1) {
      const path = i % 2 ? '/r/abc.def/pdf' : '/r/abc.def';
      expect((await proxy(request(path, { headers: { 'x-forwarded-for': ip } }))).status).not.toBe(429);
    }
    for (const path of ['/r/abc.def', '/r/abc.def/pdf']) {
      const limited = await proxy(request(path, { headers: { 'x-forwarded-for': ip } }));
      expect(limited.status).toBe(429);
      expect(Number(limited.headers.get('retry-after'))).toBeGreaterThan(0);
      expect(Number(limited.headers.get('retry-after'))).toBeLessThanOrEqual(60);
      expect(limited.headers.get('referrer-policy')).toBe('no-referrer');
    }
    // Another address is not affected.
    expect((await proxy(request('/r/abc.def', { headers: { 'x-forwarded-for': randomIp() } }))).status).not.toBe(429);
  }, 60_000);
});

describe('mail transport', () => {
  it('insists on TLS unless SMTP_TLS=off (implicit TLS on port 465)', () => {
    const e = env();
    expect(transportOptions({ ...e, SMTP_TLS: 'on', SMTP_PORT: 587 })).toMatchObject({
      requireTLS: true,
      ignoreTLS: false,
      secure: false,
    });
    expect(transportOptions({ ...e, SMTP_TLS: 'on', SMTP_PORT: 465 })).toMatchObject({ secure: true });
    expect(transportOptions({ ...e, SMTP_TLS: 'off' })).toMatchObject({
      requireTLS: false,
      ignoreTLS: true,
      secure: false,
    });
  });

  it('with TLS on, a server whose TLS cannot be used gets nothing in clear (the local fake), with it off the fake receives', async () => {
    const e = env();
    if (!process.env.SMTP_PORT) throw new Error('Start the service fakes first (scripts/test.sh does)');
    const message = { from: 'reports@setline.localhost', to: 'owner@perimeter.test', subject: 'TLS check', text: 'x' };
    await expect(
      nodemailer
        .createTransport({ ...transportOptions({ ...e, SMTP_TLS: 'on' }), connectionTimeout: 5000 })
        .sendMail(message),
    ).rejects.toThrow(/TLS|certificate|STARTTLS/i);
    await expect(
      nodemailer.createTransport(transportOptions({ ...e, SMTP_TLS: 'off' })).sendMail(message),
    ).resolves.toMatchObject({ accepted: ['owner@perimeter.test'] });
  });
});
