import { execFileSync } from 'node:child_process';
import { expect, test } from '@playwright/test';
import { DEMO_PASSWORD } from './helpers';

// Two production app servers on one PostgreSQL behind haproxy (scripts/cluster.sh), on a seeded database
// of their own: what one server does, the other knows — sessions, sign-in attempts, the report queue.
// Ports: CLUSTER_E2E_PORT (haproxy; default E2E_PORT + 500), the app servers on +10 and +20.
const PORT = Number(process.env.CLUSTER_E2E_PORT ?? Number(process.env.E2E_PORT ?? 3100) + 500);
const BALANCER = `http://127.0.0.1:${PORT}`;
const APPS = [`http://127.0.0.1:${PORT + 10}`, `http://127.0.0.1:${PORT + 20}`];
const DB_NAME = process.env.CLUSTER_E2E_DB_NAME ?? 'setline_cluster_e2e';
const MAIL = process.env.MAIL_WEB_URL;
const JOB_TITLE = 'Joint separation at the crossing'; // approved in the demo scenario

const cluster = (command: string) =>
  execFileSync('bash', ['-c', command], {
    cwd: process.cwd(),
    stdio: ['ignore', 'inherit', 'inherit'],
    timeout: 240_000,
    env: {
      ...process.env,
      PORT: String(PORT),
      DB_NAME,
      CLUSTER_SEED: 'off',
      REPORT_WORKER: 'on',
      // Both servers share these; they are the e2e run's own.
      NEXTAUTH_SECRET: 'setline-cluster-e2e-session-secret-0123456789',
      REPORT_LINK_SECRET: 'setline-cluster-e2e-report-link-secret-012345',
      SMTP_TLS: 'off',
    },
  });

test.describe.configure({ mode: 'serial' });

test.beforeAll(async () => {
  test.setTimeout(300_000);
  cluster(
    `source scripts/common.sh && fresh_database "$DB_NAME" && sequelize-cli db:seed:all >/dev/null && bash scripts/cluster.sh start`,
  );
});

test.afterAll(() => {
  cluster('bash scripts/cluster.sh stop');
});

test('a session made on one app server works on the other', async () => {
  const cookie = await signIn(APPS[0], 'office@demo.test');
  expect(cookie).toContain('session-token=');
  for (const base of APPS) {
    const session = await (await fetch(`${base}/api/auth/session`, { headers: { cookie } })).json();
    expect(session.user?.email, base).toBe('office@demo.test');
    const jobs = await fetch(`${base}/api/jobs?pageSize=1`, { headers: { cookie } });
    expect(jobs.status, base).toBe(200);
  }
  // Without the cookie the same request is refused: the 200s above were the session's doing.
  expect((await fetch(`${APPS[1]}/api/jobs?pageSize=1`)).status).toBe(401);
});

test('the sign-in throttle counts failed passwords made on both servers together', async () => {
  const email = 'tech2@demo.test';
  const statuses: number[] = [];
  for (let i = 0; i < 10; i++) statuses.push((await attempt(APPS[i % 2], email, 'not-the-password')).status);
  // Five failures on each server: the 10th of them locks, as ten on one server would.
  expect(statuses.slice(0, 9)).toEqual(Array(9).fill(401));
  expect(statuses[9]).toBe(429);
  for (const base of [...APPS, BALANCER]) {
    const right = await attempt(base, email, DEMO_PASSWORD);
    expect(right.status, base).toBe(429);
    expect(right.headers.get('set-cookie') ?? '', base).not.toContain('session-token=');
  }
});

test('a repair report is mailed once while both servers run the report worker', async () => {
  test.skip(!MAIL, 'needs the service fakes (MAIL_WEB_URL): run through scripts/test.sh');
  test.setTimeout(180_000);
  const cookie = await signIn(BALANCER, 'office@demo.test');
  const headers = { cookie, origin: BALANCER, 'content-type': 'application/json' };
  const list = await (await fetch(`${BALANCER}/api/jobs?q=${encodeURIComponent(JOB_TITLE)}`, { headers })).json();
  const job = list.items.find((j: { title: string }) => j.title === JOB_TITLE);
  expect(job, 'the demo job').toBeTruthy();
  // Three sends at once, through the balancer (so over both servers): each worker sees every job queued.
  const stamp = Date.now();
  const addresses = [1, 2, 3].map((n) => `cluster-${stamp}-${n}@example.test`);
  for (const to of addresses) {
    const sent = await fetch(`${BALANCER}/api/jobs/${job.id}/report`, {
      method: 'POST',
      headers,
      body: JSON.stringify({ to }),
    });
    expect(sent.status, await sent.clone().text()).toBeLessThan(300);
  }
  const countFor = async () => {
    const all: { to: string }[] = await (await fetch(`${MAIL}/messages`)).json();
    return addresses.map((to) => all.filter((m) => m.to.includes(to)).length);
  };
  await expect.poll(countFor, { timeout: 90_000, intervals: [1000] }).toEqual([1, 1, 1]);
  // A second worker that also took a job would mail it within moments: give it that time.
  await new Promise((resolve) => setTimeout(resolve, 8000));
  expect(await countFor()).toEqual([1, 1, 1]);
});

/** One credentials sign-in attempt against a server (CSRF token first, as next-auth's client does). */
async function attempt(base: string, email: string, password: string) {
  const csrf = await fetch(`${base}/api/auth/csrf`);
  const cookies = csrf.headers.getSetCookie().map((c) => c.split(';')[0]);
  const { csrfToken } = await csrf.json();
  return fetch(`${base}/api/auth/callback/credentials`, {
    method: 'POST',
    redirect: 'manual',
    headers: { 'content-type': 'application/x-www-form-urlencoded', cookie: cookies.join('; ') },
    body: new URLSearchParams({ csrfToken, email, password, json: 'true' }),
  });
}

async function signIn(base: string, email: string) {
  const response = await attempt(base, email, DEMO_PASSWORD);
  expect(response.status).toBeLessThan(400);
  return response.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .filter((c) => c.includes('session-token='))
    .join('; ');
}
