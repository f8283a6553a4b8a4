import { spawn } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import http from 'node:http';
import { expect, request as playwrightRequest, test, type APIRequestContext } from '@playwright/test';
import { BASE_URL } from '../../playwright.config';
import { LIMITS, recordSignInFailure } from '@/lib/security/throttle';
import { DEMO_PASSWORD, hydrated } from './helpers';

// The perimeter against the real production server: attempt limits, security headers, the API's
// cross-site and body rules, safe callbackUrl, and a server that refuses to start without its secrets.
// Each test uses its own addresses (X-Forwarded-For; the e2e server trusts no proxy, so the last entry
// is taken as sent) and its own e-mails, so the demo accounts other specs use are never locked.

const randomIp = () => `10.${[0, 0, 0].map(() => randomBytes(1)[0]).join('.')}`;
const unique = () => randomBytes(4).toString('hex');

/** A password sign-in as next-auth's client sends it, from `ip`, in the context's cookie jar. */
async function apiSignIn(context: APIRequestContext, email: string, password: string, ip: string) {
  const { csrfToken } = await (await context.get('/api/auth/csrf')).json();
  const response = await context.post('/api/auth/callback/credentials', {
    form: { email, password, csrfToken, callbackUrl: '/', json: 'true' },
    headers: { 'x-forwarded-for': ip },
  });
  const session = response
    .headersArray()
    .some((h) => h.name.toLowerCase() === 'set-cookie' && /next-auth\.session-token=[^;]+/.test(h.value));
  return {
    status: response.status(),
    retryAfter: response.headers()['retry-after'],
    session,
    body: await response.json().catch(() => null),
  };
}

async function newUser(role: 'office' | 'foreman' = 'office') {
  const admin = await playwrightRequest.newContext({ baseURL: BASE_URL });
  expect((await apiSignIn(admin, 'admin@demo.test', DEMO_PASSWORD, randomIp())).status).toBe(200);
  const email = `perimeter-${unique()}@demo.test`;
  const password = `right-password-${unique()}`;
  const made = await admin.post('/api/users', { data: { name: `Perimeter ${unique()}`, email, role, password } });
  expect(made.status()).toBe(201);
  await admin.dispose();
  return { email, password };
}

test.describe('sign-in limits', () => {
  // Every attempt is a real bcrypt comparison on a shared 2-core machine: allow minutes, not seconds.
  test.describe.configure({ timeout: 240_000 });
  test('the right password after ten wrong ones answers 429 with Retry-After and creates no session', async () => {
    const user = await newUser();
    const context = await playwrightRequest.newContext({ baseURL: BASE_URL });
    const ip = randomIp();
    for (let i = 1; i <= 9; i += 1) expect((await apiSignIn(context, user.email, `wrong-${i}`, ip)).status).toBe(401);
    const tenth = await apiSignIn(context, user.email, 'wrong-10', ip);
    expect(tenth).toMatchObject({
      status: 429,
      session: false,
      body: { error: { message: 'Too many attempts — try again in 15 minutes.' } },
    });
    expect(Number(tenth.retryAfter)).toBe(900);

    const right = await apiSignIn(context, user.email, user.password, ip);
    expect(right.status).toBe(429);
    expect(right.session).toBe(false);
    expect(Number(right.retryAfter)).toBeGreaterThan(800);
    expect(right.body).toEqual({
      error: { message: expect.stringMatching(/^Too many attempts — try again in 1[45] minutes\.$/) },
    });
    // From another address too: the lock is the e-mail's.
    expect((await apiSignIn(context, user.email, user.password, randomIp())).status).toBe(429);
    expect((await context.get('/api/jobs')).status()).toBe(401);
    await context.dispose();
  });

  test('a successful sign-in starts the count again', async () => {
    const user = await newUser();
    const context = await playwrightRequest.newContext({ baseURL: BASE_URL });
    const ip = randomIp();
    for (let i = 1; i <= 9; i += 1) expect((await apiSignIn(context, user.email, `wrong-${i}`, ip)).status).toBe(401);
    expect(await apiSignIn(context, user.email, user.password, ip)).toMatchObject({ status: 200, session: true });
    for (let i = 1; i <= 9; i += 1)
      expect((await apiSignIn(context, user.email, `wrong-again-${i}`, ip)).status).toBe(401);
    expect(await apiSignIn(context, user.email, user.password, ip)).toMatchObject({ status: 200, session: true });
    await context.dispose();
  });

  test('100 failed sign-ins from one address in an hour lock that address (counted in the store every server shares)', async () => {
    const user = await newUser();
    const context = await playwrightRequest.newContext({ baseURL: BASE_URL });
    const ip = randomIp();
    // 99 failures counted from this test process straight into the shared PostgreSQL store, as another app
    // server would count them; the server under test sees them (limits hold across servers).
    for (let i = 1; i < LIMITS.signInIp.points; i += 1) expect(await recordSignInFailure(null, ip)).toBeNull();
    // The 100th, a real wrong password over HTTP, locks the address…
    const hundredth = await apiSignIn(context, `nobody-${unique()}@demo.test`, 'x', ip);
    expect(hundredth.status).toBe(429);
    expect(Number(hundredth.retryAfter)).toBeGreaterThan(3000);
    // …so the right password from it is refused too, while another address signs in.
    expect(await apiSignIn(context, user.email, user.password, ip)).toMatchObject({ status: 429, session: false });
    expect(await apiSignIn(context, user.email, user.password, randomIp())).toMatchObject({
      status: 200,
      session: true,
    });
    await context.dispose();
  });

  test('the sign-in page shows "Too many attempts — try again in N minutes"', async ({ page }) => {
    const email = `locked-${unique()}@demo.test`;
    const context = await playwrightRequest.newContext({ baseURL: BASE_URL });
    for (let i = 1; i <= 9; i += 1)
      expect((await apiSignIn(context, email, `wrong-${i}`, randomIp())).status).toBe(401);
    await context.dispose();
    await page.goto('/sign-in');
    await hydrated(page);
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill('wrong-10');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(page.getByRole('main').getByRole('alert')).toHaveText('Too many attempts — try again in 15 minutes.');
    await expect(page).toHaveURL(/\/sign-in/);
  });
});

test.describe('report links', () => {
  test('the 61st request a minute from one address answers 429 (page and PDF)', async ({ request }) => {
    const ip = randomIp();
    for (let i = 0; i < 60; i += 1) {
      const response = await request.get(i % 2 ? '/r/not-a-link.x/pdf' : '/r/not-a-link.x', {
        headers: { 'x-forwarded-for': ip },
      });
      expect(response.status()).toBe(404);
    }
    for (const path of ['/r/not-a-link.x', '/r/not-a-link.x/pdf']) {
      const limited = await request.get(path, { headers: { 'x-forwarded-for': ip } });
      expect(limited.status()).toBe(429);
      expect(Number(limited.headers()['retry-after'])).toBeGreaterThan(0);
    }
    expect((await request.get('/r/not-a-link.x', { headers: { 'x-forwarded-for': randomIp() } })).status()).toBe(404);
  });
});

test.describe('security headers', () => {
  test('pages carry a nonce CSP that their scripts use, and the other headers', async ({ page }) => {
    const violations: string[] = [];
    page.on('console', (message) => {
      if (/Content Security Policy|Refused to/i.test(message.text())) violations.push(message.text());
    });
    const response = await page.goto('/sign-in');
    const headers = response!.headers();
    const policy = headers['content-security-policy'];
    const nonce = policy.match(/'nonce-([^']+)'/)?.[1];
    expect(nonce).toBeTruthy();
    for (const part of [
      "frame-ancestors 'none'",
      "object-src 'none'",
      "base-uri 'self'",
      "form-action 'self'",
      "default-src 'self'",
    ])
      expect(policy).toContain(part);
    expect(headers['x-content-type-options']).toBe('nosniff');
    expect(headers['referrer-policy']).toBe('strict-origin-when-cross-origin');
    expect(headers['permissions-policy']).toMatch(/^camera=\(self\)/);
    expect(headers['strict-transport-security']).toBeUndefined();
    // Next put the nonce on its scripts; the page hydrated (React ran under the policy).
    const scriptNonces = await page
      .locator('script')
      .evaluateAll((scripts) => scripts.map((s) => (s as HTMLScriptElement).nonce));
    expect(scriptNonces.length).toBeGreaterThan(0);
    expect(scriptNonces.every((n) => n === nonce)).toBe(true);
    await hydrated(page);
    // A second visit gets a new nonce.
    const again = (await page.goto('/sign-in'))!.headers()['content-security-policy'];
    expect(again).not.toBe(policy);
    expect(violations).toEqual([]);
  });

  test('API answers, report links and static files carry them too; HSTS over https', async ({ request }) => {
    const api = await request.get('/api/health');
    expect(api.headers()['x-content-type-options']).toBe('nosniff');
    expect(api.headers()['content-security-policy']).toContain("frame-ancestors 'none'");
    const link = await request.get('/r/not-a-link.x', { headers: { 'x-forwarded-for': randomIp() } });
    expect(link.headers()['referrer-policy']).toBe('no-referrer');
    expect(link.headers()['content-security-policy']).toContain("frame-ancestors 'none'");
    const https = await request.get('/api/health', { headers: { 'x-forwarded-proto': 'https' } });
    expect(https.headers()['strict-transport-security']).toMatch(/^max-age=31536000/);
  });
});

test.describe('writes to the API from elsewhere', () => {
  test('a foreign Origin, a text/plain JSON body and a 2 MB body change nothing (403, 415, 413)', async () => {
    const office = await playwrightRequest.newContext({ baseURL: BASE_URL });
    expect((await apiSignIn(office, 'office@demo.test', DEMO_PASSWORD, randomIp())).status).toBe(200);
    const total = async () => (await (await office.get('/api/customers?archived=true')).json()).total as number;
    const before = await total();
    const customer = { name: `Perimeter ${unique()}`, kind: 'property_manager' };

    const foreign = await office.post('/api/customers', {
      data: customer,
      headers: { origin: 'https://evil.example' },
    });
    expect(foreign.status()).toBe(403);
    expect(await foreign.json()).toEqual({
      error: { message: 'This request came from another site and was refused.' },
    });
    expect(
      (
        await office.post('/api/customers', { data: customer, headers: { referer: 'https://evil.example/form' } })
      ).status(),
    ).toBe(403);
    expect(
      (await office.post('/api/customers', { data: customer, headers: { 'sec-fetch-site': 'cross-site' } })).status(),
    ).toBe(403);

    const plain = await office.post('/api/customers', {
      data: JSON.stringify(customer),
      headers: { 'content-type': 'text/plain' },
    });
    expect(plain.status()).toBe(415);

    const big = JSON.stringify({ ...customer, notes: 'x'.repeat(2 * 1024 * 1024) });
    expect(
      (await office.post('/api/customers', { data: big, headers: { 'content-type': 'application/json' } })).status(),
    ).toBe(413);
    // The same body chunked (no Content-Length): the route's reader stops it.
    const cookie = (await office.storageState()).cookies.map((c) => `${c.name}=${c.value}`).join('; ');
    const chunked = await new Promise<number>((resolve, reject) => {
      const req = http.request(
        `${BASE_URL}/api/customers`,
        { method: 'POST', headers: { 'content-type': 'application/json', cookie, 'transfer-encoding': 'chunked' } },
        (res) => {
          res.resume();
          resolve(res.statusCode ?? 0);
        },
      );
      req.on('error', (error) =>
        (error as NodeJS.ErrnoException).code === 'ECONNRESET' || (error as NodeJS.ErrnoException).code === 'EPIPE'
          ? resolve(-1)
          : reject(error),
      );
      for (let i = 0; i < 4; i += 1) req.write(big.slice(i * 600_000, (i + 1) * 600_000));
      req.end();
    });
    expect(chunked).toBe(413);

    expect(await total()).toBe(before);
    // The control: the same customer from our own page is created.
    expect((await office.post('/api/customers', { data: customer, headers: { origin: BASE_URL } })).status()).toBe(201);
    expect(await total()).toBe(before + 1);
    await office.dispose();
  });
});

test.describe('callbackUrl', () => {
  for (const target of ['/\\evil.example', '//evil.example', 'https://evil.example/jobs']) {
    test(`sign-in with callbackUrl=${target} stays on the site`, async ({ page }) => {
      await page.goto(`/sign-in?callbackUrl=${encodeURIComponent(target)}`);
      await hydrated(page);
      await page.getByLabel('E-mail').fill('office@demo.test');
      await page.getByLabel('Password').fill(DEMO_PASSWORD);
      await page.getByRole('button', { name: 'Sign in' }).click();
      // Through / (which sends the office to /jobs); a loaded machine can take a while to sign in.
      await expect(page).toHaveURL(`${BASE_URL}/jobs`, { timeout: 30_000 });
    });
  }
});

test.describe('secrets', () => {
  const start = (env: Record<string, string | undefined>) =>
    new Promise<{ code: number | null; output: string }>((resolve) => {
      const child = spawn('node_modules/.bin/next', ['start', '-p', '0', '-H', '127.0.0.1'], {
        env: {
          PATH: process.env.PATH,
          DATABASE_URL: process.env.DATABASE_URL,
          NODE_ENV: 'production',
          REPORT_WORKER: 'off',
          ...env,
        } as NodeJS.ProcessEnv,
      });
      let output = '';
      child.stdout.on('data', (chunk) => (output += chunk));
      child.stderr.on('data', (chunk) => (output += chunk));
      const timer = setTimeout(() => child.kill('SIGTERM'), 30_000);
      child.on('exit', (code) => {
        clearTimeout(timer);
        resolve({ code, output });
      });
    });
  const SESSION = 'perimeter-session-secret-0123456789abcdef';
  const LINKS = 'perimeter-report-link-secret-0123456789ab';

  test('the production server refuses to start without its secrets or with a plain-http address', async () => {
    test.setTimeout(120_000);
    const noLinkKey = await start({ NEXTAUTH_SECRET: SESSION, NEXTAUTH_URL: 'http://127.0.0.1:1' });
    expect(noLinkKey.code).not.toBe(0);
    expect(noLinkKey.output).toContain('Setline cannot start, the environment is not right');
    expect(noLinkKey.output).toContain('REPORT_LINK_SECRET: required outside development and test');

    const noSession = await start({ REPORT_LINK_SECRET: LINKS });
    expect(noSession.code).not.toBe(0);
    expect(noSession.output).toContain('NEXTAUTH_SECRET: required outside development and test');

    const plainHttp = await start({
      NEXTAUTH_SECRET: SESSION,
      REPORT_LINK_SECRET: LINKS,
      NEXTAUTH_URL: 'http://setline.example.test',
    });
    expect(plainHttp.code).not.toBe(0);
    expect(plainHttp.output).toContain('NEXTAUTH_URL: must be an https:// address');
  });
});
