import { randomUUID } from 'node:crypto';
import { signIn } from './bench/lib.mjs';
const base = 'http://127.0.0.1:3519';
const cookie = await signIn(base, 'foreman@demo.test');
for (let i = 0; i < Number(process.argv[3] ?? 1); i++) {
const r = await fetch(`${base}/api/installs/${process.argv[2]}/events`, { method: 'POST', headers: { cookie, 'content-type': 'application/json' }, body: JSON.stringify({ clientEventId: randomUUID(), type: 'pressure_reading', deviceTime: new Date().toISOString(), payload: { pressureKpa: 101 } }) });
if (i === 0) console.log(r.status, (await r.text()).slice(0, 100));
}
