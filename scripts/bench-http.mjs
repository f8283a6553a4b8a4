// Throughput of a few routes, signed in as the demo office user. Loopback only; bounded in time.
import autocannon from 'autocannon';

const base = process.argv[2];

async function signIn(email) {
  const csrfRes = await fetch(`${base}/api/auth/csrf`);
  const cookies = csrfRes.headers.getSetCookie().map((c) => c.split(';')[0]);
  const { csrfToken } = await csrfRes.json();
  const res = await fetch(`${base}/api/auth/callback/credentials`, {
    method: 'POST',
    redirect: 'manual',
    headers: { 'content-type': 'application/x-www-form-urlencoded', cookie: cookies.join('; ') },
    body: new URLSearchParams({ csrfToken, email, password: 'setline-demo', json: 'true' }),
  });
  return [...cookies, ...res.headers.getSetCookie().map((c) => c.split(';')[0])].join('; ');
}

const cookie = await signIn('office@demo.test');
const routes = [
  ['GET /api/health (one SELECT 1)', '/api/health'],
  ['GET /api/jobs?pageSize=25 (signed in)', '/api/jobs?pageSize=25'],
  // Sorting by flag severity computes every install's flags and pages in memory (lib/data/installs-list).
  ['GET /api/installs?sort=severity (flags of every install)', '/api/installs?sort=severity&pageSize=25'],
  ['GET /api/customers?q=a (search, signed in)', '/api/customers?q=a&pageSize=25'],
];
console.log('| route | req/s | p50 / p97.5 / p99 ms | non-2xx |');
console.log('| --- | --- | --- | --- |');
for (const [name, path] of routes) {
  const result = await autocannon({ url: base + path, connections: 20, duration: 10, headers: { cookie } });
  const l = result.latency;
  console.log(`| ${name} | ${Math.round(result.requests.average)} | ${l.p50} / ${l.p97_5} / ${l.p99} | ${result.non2xx} |`);
}
