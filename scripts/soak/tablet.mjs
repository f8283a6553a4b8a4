// One simulated tablet: signs in as its foreman, starts its installs and sends each one's taps in
// order, as the outbox does: a tap gets its id and device time when it is made, and the same body is
// sent again until the server acknowledges it (2xx). Only an answer that can never change (a 4xx other
// than 401/408/429) stops the tablet: it means the soak's taps are wrong, and is reported.
import { randomUUID } from 'node:crypto';
import { FIXED_TAPS, installTaps } from './plan.mjs';

export class Tablet {
  constructor({ base, tablet, password, plan, onAck, gate, stopped }) {
    Object.assign(this, { base, tablet, password, plan, onAck, gate, stopped });
    this.cookie = '';
    this.lastDeviceMs = 0;
    this.sent = []; // { clientEventId, installId, seq, acknowledged }
    this.stats = { requests: 0, retries: 0, replays: 0, failures: {} };
    this.problem = null;
  }

  async run() {
    await this.signIn();
    for (const [r, count] of this.plan.entries()) {
      const repair = this.tablet.repairs[r];
      const installId = randomUUID();
      if ((await this.until(`/api/installs`, { id: installId, repairId: repair.id })) === null) return;
      const taps = installTaps(this.tablet, repair, Math.max(0, count - FIXED_TAPS)).slice(0, count);
      for (const [seq, [type, payload]] of taps.entries()) {
        if (this.stopped()) return;
        await this.gate();
        const tap = { clientEventId: randomUUID(), type, deviceTime: this.deviceTime(), payload, userId: this.userId };
        const entry = { clientEventId: tap.clientEventId, installId, seq, acknowledged: false };
        this.sent.push(entry);
        const answer = await this.until(`/api/installs/${installId}/events`, tap);
        if (answer === null) return;
        if (answer.event?.clientEventId !== tap.clientEventId)
          return this.fail(`acknowledged with another event: ${JSON.stringify(answer).slice(0, 200)}`);
        entry.acknowledged = true;
        this.onAck(entry);
      }
    }
  }

  /** Device time of a new tap: now, and never equal to or before the tablet's previous tap. */
  deviceTime() {
    this.lastDeviceMs = Math.max(Date.now(), this.lastDeviceMs + 1);
    return new Date(this.lastDeviceMs).toISOString();
  }

  /** POSTs the same body until a 2xx; null when the tablet stopped (deadline or a final refusal). */
  async until(path, body) {
    for (let attempt = 0; ; attempt++) {
      if (this.stopped() || this.problem) return null;
      if (attempt > 0) {
        this.stats.retries++;
        await sleep(Math.min(1000, 50 * 2 ** Math.min(attempt, 5)));
      }
      let response;
      try {
        this.stats.requests++;
        response = await exchange(this.base + path, {
          method: 'POST',
          headers: { 'content-type': 'application/json', origin: this.base, cookie: this.cookie },
          body: JSON.stringify(body),
        });
      } catch (error) {
        this.count(error.cause?.code ?? error.name);
        continue;
      }
      const { text } = response;
      if (response.ok) {
        if (response.status === 200) this.stats.replays++;
        try {
          return JSON.parse(text);
        } catch {
          this.count('unreadable 2xx');
          continue;
        }
      }
      this.count(String(response.status));
      if (response.status === 401) await this.signIn();
      else if (response.status < 500 && ![408, 429].includes(response.status)) {
        return this.fail(`${path} answered ${response.status}: ${text.slice(0, 300)}`);
      }
    }
  }

  /** next-auth's credentials sign-in (CSRF token, then the form post), retried while the servers are down. */
  async signIn() {
    for (let attempt = 0; !this.stopped(); attempt++) {
      if (attempt > 0) await sleep(Math.min(1000, 100 * 2 ** Math.min(attempt, 4)));
      try {
        const csrf = await exchange(`${this.base}/api/auth/csrf`, {});
        if (!csrf.ok) continue;
        const cookies = csrf.headers.getSetCookie().map((c) => c.split(';')[0]);
        const { csrfToken } = JSON.parse(csrf.text);
        const res = await exchange(`${this.base}/api/auth/callback/credentials`, {
          method: 'POST',
          redirect: 'manual',
          headers: { 'content-type': 'application/x-www-form-urlencoded', cookie: cookies.join('; ') },
          body: new URLSearchParams({ csrfToken, email: this.tablet.email, password: this.password, json: 'true' }),
        });
        const session = res.headers
          .getSetCookie()
          .map((c) => c.split(';')[0])
          .filter((c) => c.includes('session-token='));
        if (!session.length) continue;
        this.cookie = session.join('; ');
        const me = await exchange(`${this.base}/api/auth/session`, { headers: { cookie: this.cookie } });
        const user = me.ok ? JSON.parse(me.text).user : null;
        if (user?.id) {
          this.userId = user.id;
          return;
        }
      } catch {
        // down or restarting: try again
      }
    }
  }

  count(kind) {
    this.stats.failures[kind] = (this.stats.failures[kind] ?? 0) + 1;
  }

  fail(message) {
    this.problem = `${this.tablet.email}: ${message}`;
    return null;
  }
}

export const sleep = (ms) => new Promise((resolve) => setTimeout(resolve, ms));

const REQUEST_MS = 15_000;

/**
 * One request and its whole body, given up after REQUEST_MS whatever happens underneath: a request caught
 * by a server's SIGKILL could otherwise wait forever (seen here: tablets waiting with no socket open, fetch's
 * own timeout signal never firing).
 */
async function exchange(url, init) {
  const controller = new AbortController();
  let timer;
  const expired = new Promise((_, reject) => {
    timer = setTimeout(() => {
      controller.abort();
      reject(Object.assign(new Error(`no answer within ${REQUEST_MS / 1000} s`), { name: 'TimeoutError' }));
    }, REQUEST_MS);
  });
  const attempt = (async () => {
    const response = await fetch(url, { ...init, signal: controller.signal });
    const text = await response.text();
    return { ok: response.ok, status: response.status, headers: response.headers, text };
  })();
  attempt.catch(() => undefined); // settles after the deadline, if ever: nobody waits for it then
  try {
    return await Promise.race([attempt, expired]);
  } finally {
    clearTimeout(timer);
  }
}
