// npm run soak (started by scripts/soak.sh, which makes the database and the server or cluster ready):
// 20 simulated tablets send 10,000 taps while the app server is SIGKILLed 5 times and PostgreSQL is
// stopped with `pg_ctl stop -m immediate` twice; then every acknowledged tap must be stored exactly once,
// in its install's order. Ends with one line:
//   soak: 10000 taps, 10000 acknowledged, 10000 stored, 0 lost, 0 duplicated, 5 kills, 2 database stops
// and exits non-zero on any loss, duplicate, broken order, refused tap, missed fault or the deadline.
// Environment: DATABASE_URL, SOAK_TARGET (plain | cluster), PORT, SOAK_ACK_FILE (each acknowledged
// clientEventId, one per line), SOAK_TABLETS (20), SOAK_TAPS (10000), SOAK_KILLS (5), SOAK_DB_STOPS (2),
// SOAK_TAPS_PER_INSTALL (50), SOAK_DEADLINE_SECONDS (1800).
import { createWriteStream } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import pg from 'pg';
import { ClusterServers, SingleServer, crashDatabase } from './faults.mjs';
import { SOAK_PASSWORD, seedSoakCompany } from './setup.mjs';
import { splitTaps } from './plan.mjs';
import { Tablet, sleep } from './tablet.mjs';
import { verify } from './verify.mjs';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const int = (name, fallback) => {
  const value = Number(process.env[name] ?? fallback);
  if (!Number.isInteger(value) || value < 0) throw new Error(`${name} must be a whole number`);
  return value;
};
const TABLETS = int('SOAK_TABLETS', 20);
const TAPS = int('SOAK_TAPS', 10_000);
const KILLS = int('SOAK_KILLS', 5);
const DB_STOPS = int('SOAK_DB_STOPS', 2);
const PER_INSTALL = Math.max(14, int('SOAK_TAPS_PER_INSTALL', 50));
const DEADLINE_MS = int('SOAK_DEADLINE_SECONDS', 1800) * 1000;
const TARGET = process.env.SOAK_TARGET === 'cluster' ? 'cluster' : 'plain';
const PORT = int('PORT', 3400);
const say = (message) => console.log(`[soak] ${message}`);

const started = Date.now();
const server =
  TARGET === 'cluster'
    ? new ClusterServers({ root, port: PORT })
    : new SingleServer({ root, port: PORT, stateDir: path.join(root, '.data/soak') });
let stopping = false;
for (const signal of ['SIGINT', 'SIGTERM'])
  process.on(signal, () => {
    stopping = true;
    server.stop();
    process.exit(130);
  });
process.on('exit', () => server.stop());

// Each tablet's share of the taps, spread over installs of about PER_INSTALL taps.
const plans = Array.from({ length: TABLETS }, (_, i) =>
  splitTaps(Math.floor(TAPS / TABLETS) + (i < TAPS % TABLETS ? 1 : 0), PER_INSTALL),
);
const durability = await durabilitySettings(process.env.DATABASE_URL);
if (durability.fsync !== 'on' || durability.synchronous_commit !== 'on') {
  throw new Error(`the soak needs fsync and synchronous_commit on; the database has ${JSON.stringify(durability)}`);
}
const { companyId, tablets } = await seedSoakCompany(
  process.env.DATABASE_URL,
  plans.map((p) => p.length),
);
say(
  `${TARGET} target on ${server.base}: ${TABLETS} tablets, ${TAPS} taps over ${plans.flat().length} installs (fsync ${durability.fsync}, synchronous_commit ${durability.synchronous_commit})`,
);
await server.start();

// The faults, spread over the run by acknowledged taps; a tablet waits at a fault's mark until it has begun.
const kinds = spread(KILLS, DB_STOPS);
const marks = kinds.map((_, i) => Math.floor((TAPS * (i + 1)) / (kinds.length + 1)));
let acknowledged = 0;
let faultsBegun = 0;
const done = { kills: 0, stops: 0 };
const ackFile = process.env.SOAK_ACK_FILE ? createWriteStream(process.env.SOAK_ACK_FILE) : null;
const deadline = started + DEADLINE_MS;
const stopped = () => stopping || Date.now() > deadline;

const workers = tablets.map(
  (tablet, i) =>
    new Tablet({
      base: server.base,
      tablet,
      password: SOAK_PASSWORD,
      plan: plans[i],
      stopped,
      gate: async () => {
        while (faultsBegun < marks.length && acknowledged >= marks[faultsBegun] && !stopped()) await sleep(20);
      },
      onAck: (entry) => {
        acknowledged++;
        ackFile?.write(`${entry.clientEventId}\n`);
      },
    }),
);

let finished = 0;
const progress = setInterval(
  () => say(`${acknowledged} acknowledged after ${((Date.now() - started) / 1000).toFixed(0)} s`),
  60_000,
);
progress.unref();
const allDone = () => finished === workers.length;
const faults = (async () => {
  for (const [i, kind] of kinds.entries()) {
    while (acknowledged < marks[i] && !stopped() && !allDone()) await sleep(50);
    if (stopped() || allDone()) return;
    faultsBegun = i + 1;
    // Down long enough for every tablet to meet the outage, short enough to keep the run bounded.
    const downMs = kind === 'kill' ? 1500 : 3000;
    const at = `${acknowledged} acknowledged`;
    const what = kind === 'kill' ? await server.crash(downMs) : await crashDatabase(root, server.base, downMs);
    if (kind === 'kill') done.kills++;
    else done.stops++;
    say(
      `${kind === 'kill' ? `SIGKILL ${what}` : 'pg_ctl stop -m immediate'} at ${at}; back after ${((Date.now() - started) / 1000).toFixed(0)} s into the run`,
    );
  }
})();
await Promise.all(workers.map((w) => w.run().finally(() => finished++)));
await faults;
clearInterval(progress);
await new Promise((resolve) => (ackFile ? ackFile.end(resolve) : resolve()));

const seconds = (Date.now() - started) / 1000;
const result = await verify(process.env.DATABASE_URL, companyId, workers);
const stats = workers.reduce(
  (sum, w) => {
    sum.requests += w.stats.requests;
    sum.retries += w.stats.retries;
    sum.replays += w.stats.replays;
    for (const [k, v] of Object.entries(w.stats.failures)) sum.failures[k] = (sum.failures[k] ?? 0) + v;
    return sum;
  },
  { requests: 0, retries: 0, replays: 0, failures: {} },
);
say(
  `${seconds.toFixed(0)} s; ${stats.requests} requests, ${stats.retries} retries, ${stats.replays} answered as replays; failed tries: ${JSON.stringify(stats.failures)}`,
);
for (const problem of [...workers.map((w) => w.problem).filter(Boolean), ...result.problems]) say(`PROBLEM ${problem}`);
if (Date.now() > deadline)
  say(`PROBLEM the deadline of ${DEADLINE_MS / 1000} s passed before every tap was acknowledged`);

const ok =
  result.lost === 0 &&
  result.duplicated === 0 &&
  result.problems.length === 0 &&
  acknowledged === TAPS &&
  workers.every((w) => !w.problem) &&
  done.kills === KILLS &&
  done.stops === DB_STOPS;
console.log(
  `soak: ${TAPS} taps, ${acknowledged} acknowledged, ${result.stored} stored, ${result.lost} lost, ${result.duplicated} duplicated, ${done.kills} kills, ${done.stops} database stops`,
);
process.exit(ok ? 0 : 1);

/** Kills and database stops interleaved, the database stops in the middle of the run. */
function spread(kills, stops) {
  const list = Array(kills).fill('kill');
  for (let s = 0; s < stops; s++) list.splice(Math.round(((s + 1) * (list.length + 1)) / (stops + 1)), 0, 'stop');
  return list;
}

async function durabilitySettings(databaseUrl) {
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    const { rows } = await client.query(
      `SELECT name, setting FROM pg_settings WHERE name IN ('fsync', 'synchronous_commit')`,
    );
    return Object.fromEntries(rows.map((r) => [r.name, r.setting]));
  } finally {
    await client.end();
  }
}
