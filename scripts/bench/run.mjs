// The figures of `npm run bench`, measured in one run against the production server at argv[2]:
// (a)–(i) as in DEVELOPERS.md "Bench". Prints one table (figure, goal, measured, pass/fail) and writes the same
// as JSON to BENCH_JSON when set. BENCH_SMOKE=1: short durations, Lighthouse skipped, goals not enforced.
// Loopback only; every load is bounded in time or in requests.
import { fork } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { fileURLToPath } from 'node:url';
import { load, loadSame, printTable, rate, round, signIn } from './lib.mjs';
import { lighthouse } from './lighthouse.mjs';

const base = process.argv[2];
const seeded = JSON.parse(fs.readFileSync(process.argv[3], 'utf8'));
const SMOKE = process.env.BENCH_SMOKE === '1';
const DURATION = Number(process.env.BENCH_DURATION ?? (SMOKE ? 1 : 10));
const CONNECTIONS = 20;
const LATENCY_TAPS = Number(process.env.BENCH_LATENCY_TAPS ?? (SMOKE ? 20 : 300));
const here = path.dirname(fileURLToPath(import.meta.url));
// BENCH_ONLY=c,f,i measures only those figures (and (a), the reference of the ratios); the default is all.
const ONLY = process.env.BENCH_ONLY ? process.env.BENCH_ONLY.split(',').map((f) => f.trim()) : null;
const only = (figure) => !ONLY || ONLY.includes(figure);

const rows = [];
/** One row of the table; `pass` null when the figure is a reference without a goal of its own. */
const row = (figure, name, goal, measured, pass, values = {}) => {
  rows.push({ figure, name, goal, measured, pass, values });
  console.error(`[bench] ${figure} ${name}: ${measured}`);
};

const office = await signIn(base, 'office@demo.test');
const foreman = await signIn(base, 'foreman@demo.test');
const json = { 'content-type': 'application/json' };

// (a) framework floor
const health = await loadSame(base, { connections: CONNECTIONS, duration: DURATION, path: '/api/health' });
row('a', 'GET /api/health (framework + SELECT 1), 20 connections', 'reference', rate(health), null, health);

if (only('b')) {
  // (b) database floor: a bare node:http + pg INSERT server started here
  const floorPort = Number(new URL(base).port) + 1000;
  const floor = fork(path.join(here, 'floor-server.mjs'), [String(floorPort)], {
    stdio: ['ignore', 'inherit', 'inherit', 'ipc'],
  });
  await new Promise((resolve, reject) => {
    floor.once('message', resolve);
    floor.once('exit', (code) => reject(new Error(`the floor server stopped (${code})`)));
  });
  const floorBase = `http://127.0.0.1:${floorPort}`;
  const dbFloor = await loadSame(floorBase, {
    connections: CONNECTIONS,
    duration: DURATION,
    path: '/',
    method: 'POST',
    headers: json,
    body: '{"n":1}',
  });
  floor.kill('SIGTERM');
  row('b', 'bare node:http + one pg INSERT, 20 connections', 'reference', rate(dbFloor), null, dbFloor);
}

// (c) taps from 20 connections, each its own install (a tablet each)
const pressureTap = (installId) => ({
  path: `/api/installs/${installId}/events`,
  method: 'POST',
  headers: { ...json, cookie: foreman },
  setupRequest: (req) => ({
    ...req,
    body: JSON.stringify({
      clientEventId: randomUUID(),
      type: 'pressure_reading',
      deviceTime: new Date().toISOString(),
      payload: { pressureKpa: 101 },
    }),
  }),
});
if (only('c')) {
  const taps = await load(base, {
    streams: CONNECTIONS,
    duration: DURATION,
    request: (i) => pressureTap(seeded.tapInstalls[i % seeded.tapInstalls.length]),
  });
  const tapsPass = taps.non2xx === 0 && taps.rps >= 0.5 * health.rps && taps.p99 < 100;
  row(
    'c',
    'tap POST /api/installs/:id/events, 20 connections over 20 installs',
    '≥ 0.5 × (a) req/s and p99 < 100 ms',
    `${rate(taps)} (${round(taps.rps / health.rps, 2)} × a)${taps.non2xx ? `, ${taps.non2xx} non-2xx` : ''}`,
    tapsPass,
    taps,
  );
}

if (only('d')) {
  // (d) one connection: taps on installs at ~10 events, then on installs at ~1,000 (a different install each tap)
  const latencyRun = async (ids) => {
    let next = 0;
    return load(base, {
      streams: 1,
      amount: LATENCY_TAPS,
      request: () => ({
        ...pressureTap(ids[0]),
        setupRequest: (req) => ({
          ...req,
          path: `/api/installs/${ids[next++ % ids.length]}/events`,
          body: JSON.stringify({
            clientEventId: randomUUID(),
            type: 'pressure_reading',
            deviceTime: new Date().toISOString(),
            payload: { pressureKpa: 101 },
          }),
        }),
      }),
    });
  };
  const short = await latencyRun(seeded.shortInstalls);
  const long = await latencyRun(seeded.longInstalls);
  const ratio = long.mean / short.mean;
  row(
    'd',
    'tap latency, 1 connection: ~10 vs ~1,000 events in the install',
    'at 1,000 ≤ 1.2 × at 10',
    `${round(short.mean, 1)} ms vs ${round(long.mean, 1)} ms mean (× ${round(ratio, 2)})`,
    short.non2xx + long.non2xx === 0 && ratio <= 1.2,
    { short, long, ratio },
  );
}

if (only('e')) {
  // (e) the jobs list
  const jobs = await loadSame(base, {
    connections: CONNECTIONS,
    duration: DURATION,
    path: '/api/jobs?pageSize=25',
    headers: { cookie: office },
  });
  row(
    'e',
    'GET /api/jobs?pageSize=25, 20 connections',
    '≥ 0.5 × (a) req/s',
    `${rate(jobs)} (${round(jobs.rps / health.rps, 2)} × a)`,
    jobs.non2xx === 0 && jobs.rps >= 0.5 * health.rps,
    jobs,
  );
}

if (only('f')) {
  // (f) the review list by severity over the seeded installs
  const list = await loadSame(base, {
    connections: CONNECTIONS,
    duration: DURATION,
    path: '/api/installs?sort=severity&pageSize=25',
    headers: { cookie: office },
  });
  row(
    'f',
    `GET /api/installs?sort=severity&pageSize=25 over ${seeded.counts.installs} installs, 20 connections`,
    'p95 < 80 ms',
    `p95 ${round(list.p95, 1)} ms (${rate(list)})`,
    list.non2xx === 0 && list.p95 < 80,
    list,
  );
}

// The running install's page: (g) weighs it, (h) runs Lighthouse on it.
const installId = seeded.templateIds.running;

if (only('g')) {
  // (g) first-load JavaScript of four pages, gzipped, from the production build
  const pages = [
    ['sign-in', '/sign-in', null, 120],
    ['today', '/today', foreman, null],
    ['install screen', `/installs/${installId}`, foreman, 150],
    ['jobs', '/jobs', office, null],
  ];
  for (const [name, page, cookie, goalKb] of pages) {
    const kb = await firstLoadJsKb(page, cookie).catch((error) => {
      row('g', `first-load JS of ${name}`, goalKb ? `≤ ${goalKb} kB` : 'reference', `error: ${error.message}`, false);
      return null;
    });
    if (kb === null) continue;
    row(
      'g',
      `first-load JS of ${name} (${page.replace(installId, '[id]')}), gzipped`,
      goalKb ? `≤ ${goalKb} kB` : 'reference',
      `${round(kb, 1)} kB`,
      goalKb ? kb <= goalKb : null,
      { kb },
    );
  }
}

// (h) Lighthouse (mobile preset) of the install screen against a minimal page of the same app
if (only('h')) {
  try {
    await lighthouseRows();
  } catch (error) {
    row(
      'h',
      'Lighthouse LCP and TBT, install screen vs /sign-in',
      'LCP ≤ 1.1 × sign-in; TBT ≤ 200 ms',
      `error: ${error.message.split('\n')[0]}`,
      false,
    );
  }
}

async function lighthouseRows() {
  if (SMOKE) {
    row(
      'h',
      'Lighthouse LCP and TBT, install screen vs /sign-in',
      'LCP ≤ 1.1 × sign-in; TBT ≤ 200 ms',
      'skipped (smoke)',
      null,
    );
  } else {
    const signInPage = await lighthouse(`${base}/sign-in`, null);
    const installPage = await lighthouse(`${base}/installs/${installId}`, foreman);
    row(
      'h',
      'Lighthouse (mobile) of /sign-in (the minimal page)',
      'reference',
      `LCP ${round(signInPage.lcp)} ms, TBT ${round(signInPage.tbt)} ms`,
      null,
      signInPage,
    );
    row(
      'h',
      'Lighthouse (mobile) LCP of the install screen',
      '≤ 1.1 × sign-in LCP',
      `${round(installPage.lcp)} ms (× ${round(installPage.lcp / signInPage.lcp, 2)})`,
      installPage.lcp <= 1.1 * signInPage.lcp,
      installPage,
    );
    row(
      'h',
      'Lighthouse (mobile) TBT of the install screen',
      '≤ 200 ms',
      `${round(installPage.tbt)} ms`,
      installPage.tbt <= 200,
      installPage,
    );
    if (!installPage.finalUrl.includes('/installs/'))
      throw new Error(`the install screen ended on ${installPage.finalUrl}`);
  }
}

if (only('i')) {
  // (i) insights over the seeded installs (a route of its own; "route missing" until it exists)
  const to = new Date().toISOString().slice(0, 10);
  const from = new Date(Date.now() - 90 * 86_400_000).toISOString().slice(0, 10);
  const insightsPath = `/api/insights?from=${from}&to=${to}`;
  const probe = await fetch(base + insightsPath, { headers: { cookie: office } });
  if (probe.status === 404) {
    row('i', 'GET /api/insights?from=&to=, 20 connections', 'p95 < 200 ms', 'route missing', false);
  } else if (probe.status !== 200) {
    row('i', 'GET /api/insights?from=&to=, 20 connections', 'p95 < 200 ms', `answers ${probe.status}`, false);
  } else {
    const insights = await loadSame(base, {
      connections: CONNECTIONS,
      duration: DURATION,
      path: insightsPath,
      headers: { cookie: office },
    });
    row(
      'i',
      `GET /api/insights?from=&to= over ${seeded.counts.installs} installs, 20 connections`,
      'p95 < 200 ms',
      `p95 ${round(insights.p95, 1)} ms (${rate(insights)})`,
      insights.non2xx === 0 && insights.p95 < 200,
      insights,
    );
  }
}

printTable(rows);
if (process.env.BENCH_JSON) {
  fs.writeFileSync(
    process.env.BENCH_JSON,
    JSON.stringify(
      { generatedAt: new Date().toISOString(), smoke: SMOKE, durationSeconds: DURATION, seeded: seeded.counts, rows },
      null,
      2,
    ),
  );
}
const failed = rows.filter((r) => r.pass === false).length;
console.error(`[bench] ${rows.length} rows, ${failed} below goal${SMOKE ? ' (smoke: goals not enforced)' : ''}`);
process.exit(!SMOKE && failed ? 1 : 0);

/** Sum of the gzipped sizes of the scripts a page loads on its first visit (its <script src> tags). */
async function firstLoadJsKb(page, cookie) {
  const res = await fetch(base + page, { headers: cookie ? { cookie } : {}, redirect: 'manual' });
  if (res.status !== 200) throw new Error(`${page} answered ${res.status}`);
  const html = await res.text();
  // Scripts marked noModule (legacy polyfills) are not loaded by the browsers the app supports.
  const tags = [...html.matchAll(/<script\b[^>]*>/g)].map((m) => m[0]).filter((tag) => !/\snomodule\b/i.test(tag));
  const srcs = [
    ...new Set(tags.flatMap((tag) => [...tag.matchAll(/\ssrc="([^"]+)"/g)].map((m) => m[1].replace(/&amp;/g, '&')))),
  ];
  let bytes = 0;
  for (const src of srcs) {
    const script = await fetch(new URL(src, base));
    bytes += gzipSync(Buffer.from(await script.arrayBuffer())).length;
  }
  return bytes / 1024;
}
