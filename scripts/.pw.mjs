import { gzipSync } from 'node:zlib';
import { scriptsOf } from './bench/page-weight.mjs';
import { signIn } from './bench/lib.mjs';
const base = 'http://127.0.0.1:3519';
const cookie = await signIn(base, 'foreman@demo.test');
for (const path of process.argv.slice(2)) {
  const html = await (await fetch(base + path, { headers: { cookie } })).text();
  const rows = [];
  for (const src of scriptsOf(html)) { const b = Buffer.from(await (await fetch(base + src)).arrayBuffer()); rows.push([gzipSync(b, { level: 9 }).length, b.length, src]); }
  rows.sort((a, b) => b[0] - a[0]);
  console.log(path, 'total gz', (rows.reduce((a, r) => a + r[0], 0) / 1000).toFixed(1));
  for (const r of rows) console.log((r[0] / 1000).toFixed(1).padStart(7), (r[1] / 1000).toFixed(0).padStart(6), r[2]);
}
