// Shared by the bench scripts: sign-in, closed-loop load (autocannon), percentiles. Loopback only.
import autocannon from 'autocannon';

export const DEMO_PASSWORD = 'setline-demo';

/** A session cookie for a demo user, through next-auth's own credentials callback. */
export async function signIn(base, email) {
  const csrfRes = await fetch(`${base}/api/auth/csrf`);
  const cookies = csrfRes.headers.getSetCookie().map((c) => c.split(';')[0]);
  const { csrfToken } = await csrfRes.json();
  const res = await fetch(`${base}/api/auth/callback/credentials`, {
    method: 'POST',
    redirect: 'manual',
    headers: { 'content-type': 'application/x-www-form-urlencoded', cookie: cookies.join('; ') },
    body: new URLSearchParams({ csrfToken, email, password: DEMO_PASSWORD, json: 'true' }),
  });
  const all = [...cookies, ...res.headers.getSetCookie().map((c) => c.split(';')[0])];
  if (!all.some((c) => c.startsWith('next-auth.session-token=')))
    throw new Error(`sign-in of ${email} failed (${res.status})`);
  return all.join('; ');
}

/** The p-th percentile (0–100) of a list of numbers, nearest-rank. */
export function percentile(values, p) {
  if (values.length === 0) return NaN;
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1))];
}

// Every timed load first runs the same requests for BENCH_WARMUP seconds (default 2, none in the smoke), unmeasured:
// the figures are the server's steady state, not its first requests through cold code.
const WARMUP_S = Number(process.env.BENCH_WARMUP ?? (process.env.BENCH_SMOKE === '1' ? 0 : 2));

/**
 * Closed-loop load: `streams` independent connections, each its own autocannon instance (so each can keep
 * its own state, e.g. one install per simulated tablet), for `duration` seconds or `amount` requests each.
 * `request(i)` gives stream i's { method, path, headers, body, setupRequest }.
 */
export async function load(base, { streams = 1, duration, amount, request }) {
  if (duration && WARMUP_S > 0) await timedLoad(base, { streams, duration: WARMUP_S, request });
  return timedLoad(base, { streams, duration, amount, request });
}

async function timedLoad(base, { streams, duration, amount, request }) {
  const latencies = [];
  let non2xx = 0;
  let errors = 0;
  const started = performance.now();
  const runs = Array.from({ length: streams }, (_, i) => {
    const { path, setupRequest, ...rest } = request(i);
    const instance = autocannon({
      url: base + path,
      connections: 1,
      ...(amount ? { amount } : { duration }),
      ...rest,
      ...(setupRequest ? { requests: [{ setupRequest }] } : {}),
    });
    instance.on('response', (_client, status, _bytes, ms) => {
      latencies.push(ms);
      if (status < 200 || status > 299) non2xx += 1;
    });
    return instance.then((result) => {
      errors += result.errors + result.timeouts;
    });
  });
  await Promise.all(runs);
  const seconds = (performance.now() - started) / 1000;
  const mean = latencies.reduce((a, b) => a + b, 0) / (latencies.length || 1);
  return {
    requests: latencies.length,
    rps: latencies.length / seconds,
    mean,
    p50: percentile(latencies, 50),
    p95: percentile(latencies, 95),
    p99: percentile(latencies, 99),
    non2xx,
    errors,
  };
}

/** Many connections with the same request (one autocannon instance). */
export async function loadSame(base, { connections, duration, amount, path, headers, method = 'GET', body }) {
  if (duration && WARMUP_S > 0)
    await autocannon({ url: base + path, connections, duration: WARMUP_S, headers, method, body });
  const latencies = [];
  let non2xx = 0;
  const started = performance.now();
  const instance = autocannon({
    url: base + path,
    connections,
    ...(amount ? { amount } : { duration }),
    headers,
    method,
    body,
  });
  instance.on('response', (_client, status, _bytes, ms) => {
    latencies.push(ms);
    if (status < 200 || status > 299) non2xx += 1;
  });
  const result = await instance;
  const seconds = (performance.now() - started) / 1000;
  const mean = latencies.reduce((a, b) => a + b, 0) / (latencies.length || 1);
  return {
    requests: latencies.length,
    rps: latencies.length / seconds,
    mean,
    p50: percentile(latencies, 50),
    p95: percentile(latencies, 95),
    p99: percentile(latencies, 99),
    non2xx,
    errors: result.errors + result.timeouts,
  };
}

export const round = (value, digits = 0) => (Number.isFinite(value) ? Number(value.toFixed(digits)) : null);

/** A load's rate and latency percentiles, as one cell of the table. */
export function rate(r) {
  return `${round(r.rps)} req/s, p50 ${round(r.p50, 1)} / p95 ${round(r.p95, 1)} / p99 ${round(r.p99, 1)} ms`;
}

/** The table of rows as Markdown on stdout. */
export function printTable(rows) {
  const mark = (pass) => (pass === null ? '—' : pass ? 'pass' : 'FAIL');
  console.log('| figure | what | goal | measured | pass/fail |');
  console.log('| --- | --- | --- | --- | --- |');
  for (const r of rows) console.log(`| ${r.figure} | ${r.name} | ${r.goal} | ${r.measured} | ${mark(r.pass)} |`);
}
