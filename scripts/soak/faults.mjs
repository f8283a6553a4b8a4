// What the soak breaks while the tablets send: the app server (SIGKILL, then a fresh start) and
// PostgreSQL (`pg_ctl stop -m immediate`, then a start that recovers from the WAL). Everything runs on
// 127.0.0.1 and every wait is bounded.
import { execFile, spawn } from 'node:child_process';
import { mkdirSync, openSync, writeFileSync } from 'node:fs';
import { promisify } from 'node:util';
import { sleep } from './tablet.mjs';

const run = promisify(execFile);

/** The plain target: one `next start` this script owns (its own process group, so SIGKILL takes next-server too). */
export class SingleServer {
  constructor({ root, port, stateDir }) {
    Object.assign(this, { root, port, stateDir });
    this.base = `http://127.0.0.1:${port}`;
    this.child = null;
    mkdirSync(stateDir, { recursive: true });
  }

  async start() {
    const log = openSync(`${this.stateDir}/app.log`, 'a');
    this.child = spawn(`${this.root}/node_modules/.bin/next`, ['start', '-p', String(this.port), '-H', '127.0.0.1'], {
      cwd: this.root,
      detached: true,
      stdio: ['ignore', log, log],
      env: process.env,
    });
    writeFileSync(`${this.stateDir}/app.pid`, String(this.child.pid));
    await waitHealthy(this.base, 120_000);
  }

  /** SIGKILL, a moment down (tablets meet refused connections), then up again. */
  async crash(downMs) {
    killGroup(this.child?.pid);
    await sleep(downMs);
    await this.start();
    return 'app server';
  }

  stop() {
    killGroup(this.child?.pid);
  }
}

/** The cluster target (scripts/cluster.sh): kills hit one app server at a time, in turn. */
export class ClusterServers {
  constructor({ root, port }) {
    Object.assign(this, { root, port });
    this.base = `http://127.0.0.1:${port}`;
    this.next = 1;
  }

  async start() {
    await waitHealthy(this.base, 120_000);
  }

  async crash(downMs) {
    const n = this.next;
    this.next = n === 1 ? 2 : 1;
    await this.cluster('kill-app', n);
    await sleep(downMs);
    await this.cluster('start-app', n);
    await waitHealthy(`http://127.0.0.1:${this.port + 10 * n}`, 120_000);
    return `app server ${n}`;
  }

  cluster(...args) {
    return run('bash', [`${this.root}/scripts/cluster.sh`, ...args.map(String)], {
      cwd: this.root,
      env: { ...process.env, PORT: String(this.port) },
      timeout: 30_000,
    });
  }

  stop() {}
}

/** PostgreSQL stopped as by a power cut, down for `downMs`, started again (crash recovery). */
export async function crashDatabase(root, base, downMs) {
  await run('bash', [`${root}/scripts/db.sh`, 'crash'], { cwd: root, timeout: 60_000 });
  await sleep(downMs);
  await run('bash', [`${root}/scripts/db.sh`, 'start'], { cwd: root, timeout: 120_000 });
  await waitHealthy(base, 120_000);
  return 'database';
}

export async function waitHealthy(base, timeoutMs) {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    try {
      const res = await fetch(`${base}/api/health`, { signal: AbortSignal.timeout(5000) });
      if (res.ok) return;
    } catch {
      // not up yet
    }
    await sleep(250);
  }
  throw new Error(`${base}/api/health did not answer 200 within ${timeoutMs / 1000} s`);
}

function killGroup(pid) {
  if (!pid) return;
  try {
    process.kill(-pid, 'SIGKILL');
  } catch {
    // already gone
  }
}
