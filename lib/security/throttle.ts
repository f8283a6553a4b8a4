import pg from 'pg';
import { RateLimiterPostgres, type RateLimiterRes } from 'rate-limiter-flexible';
import { env } from '@/lib/env';

// Attempt limits kept in PostgreSQL (rate-limiter-flexible's store, table `rate_limits` made by a
// migration), so every app server behind a load balancer counts the same attempts. Used by the sign-in
// route (lib/auth/sign-in-throttle.ts) and by proxy.ts for the customer's report links. Imports no
// server-only module: proxy.ts runs it too.

/** The limits (common practice for sign-in lockouts; the numbers are the product's own). */
export const LIMITS = {
  /** Consecutive failed passwords for one e-mail: the 10th locks the e-mail for 15 minutes. */
  signInEmail: { points: 10, duration: 15 * 60, blockDuration: 15 * 60 },
  /** Failed sign-ins from one address in an hour. */
  signInIp: { points: 100, duration: 60 * 60 },
  /** Requests to /r/<token> and everything under it, per address and minute. */
  reportLink: { points: 60, duration: 60 },
} as const;

type Limiters = { signInEmail: RateLimiterPostgres; signInIp: RateLimiterPostgres; reportLink: RateLimiterPostgres };
const globalForThrottle = globalThis as unknown as {
  setlineThrottle?: { url: string; pool: pg.Pool; limiters: Limiters };
};

function limiters(): Limiters {
  const url = env().DATABASE_URL;
  const current = globalForThrottle.setlineThrottle;
  if (current?.url === url) return current.limiters;
  // A small pool of its own: the proxy has no Sequelize, and a limiter query must not wait behind app work.
  const pool = new pg.Pool({ connectionString: url, max: 3, idleTimeoutMillis: 10_000 });
  pool.on('error', (error) => console.error('[throttle] idle connection error', error.message));
  const make = (keyPrefix: string, options: { points: number; duration: number; blockDuration?: number }) =>
    new RateLimiterPostgres({
      storeClient: pool,
      storeType: 'pool',
      tableName: 'rate_limits',
      tableCreated: true,
      keyPrefix,
      ...options,
    });
  const made: Limiters = {
    signInEmail: make('signin-email', LIMITS.signInEmail),
    signInIp: make('signin-ip', LIMITS.signInIp),
    reportLink: make('report-link', LIMITS.reportLink),
  };
  if (current) void current.pool.end().catch(() => undefined);
  globalForThrottle.setlineThrottle = { url, pool, limiters: made };
  return made;
}

const isLimiterResult = (value: unknown): value is RateLimiterRes =>
  typeof value === 'object' &&
  value !== null &&
  !(value instanceof Error) &&
  typeof (value as RateLimiterRes).msBeforeNext === 'number';

/** Whole seconds until a limit lets the next attempt through (at least 1). */
const secondsOf = (ms: number) => Math.max(1, Math.ceil(ms / 1000));

/**
 * The client's address. Next sets X-Forwarded-For to the socket's address when a request has none;
 * behind TRUSTED_PROXY proxies that each append to it, the client is that many entries from the right.
 * Reached directly (TRUSTED_PROXY=0) a client could send its own header, so the per-address limits
 * are then a best effort; the per-e-mail lock does not depend on the address.
 */
export function clientIp(headers: Headers, hops = env().TRUSTED_PROXY): string {
  const chain = (headers.get('x-forwarded-for') ?? '')
    .split(',')
    .map((part) => part.trim())
    .filter(Boolean);
  const picked = chain[chain.length - Math.max(1, hops)] ?? chain[0] ?? headers.get('x-real-ip')?.trim();
  return (picked || 'unknown').slice(0, 64);
}

const emailKey = (email: string) => email.trim().toLowerCase().slice(0, 200);

/** Seconds to wait when sign-in is locked for this e-mail or address, else null. Read-only. */
export async function signInLockedFor(email: string | null, ip: string): Promise<number | null> {
  const { signInEmail, signInIp } = limiters();
  const [byEmail, byIp] = await Promise.all([email ? signInEmail.get(emailKey(email)) : null, signInIp.get(ip)]);
  const waits = [
    byEmail && byEmail.consumedPoints >= LIMITS.signInEmail.points ? byEmail.msBeforeNext : null,
    byIp && byIp.consumedPoints >= LIMITS.signInIp.points ? byIp.msBeforeNext : null,
  ].filter((ms): ms is number => ms !== null);
  return waits.length ? secondsOf(Math.max(...waits)) : null;
}

/** Counts a failed password; returns the seconds of the lock it starts (the 10th for an e-mail, the 100th for an address), else null. */
export async function recordSignInFailure(email: string | null, ip: string): Promise<number | null> {
  const { signInEmail, signInIp } = limiters();
  const waits: number[] = [];
  if (email) {
    const res = await signInEmail.penalty(emailKey(email), 1);
    if (res.consumedPoints >= LIMITS.signInEmail.points) {
      await signInEmail.block(emailKey(email), LIMITS.signInEmail.blockDuration);
      waits.push(LIMITS.signInEmail.blockDuration * 1000);
    }
  }
  const res = await signInIp.penalty(ip, 1);
  if (res.consumedPoints >= LIMITS.signInIp.points) waits.push(res.msBeforeNext);
  return waits.length ? secondsOf(Math.max(...waits)) : null;
}

/** A successful sign-in starts the e-mail's count again (the address's count stays). */
export async function recordSignInSuccess(email: string): Promise<void> {
  await limiters().signInEmail.delete(emailKey(email));
}

/** Counts one request to a report link; returns the seconds to wait when over the limit, else null. */
export async function reportLinkLimited(ip: string): Promise<number | null> {
  try {
    await limiters().reportLink.consume(ip, 1);
    return null;
  } catch (rejection) {
    // Over the limit the library rejects with its result object (not an Error). Checked by shape: the
    // proxy's bundle may hold its own copy of the class, so instanceof is not reliable there.
    if (isLimiterResult(rejection)) return secondsOf(rejection.msBeforeNext);
    throw rejection;
  }
}

/** The answer to a throttled request: 429 with Retry-After and the message the sign-in page shows. */
export function tooManyAttempts(seconds: number): Response {
  const minutes = Math.max(1, Math.ceil(seconds / 60));
  const message = `Too many attempts — try again in ${minutes} minute${minutes === 1 ? '' : 's'}.`;
  return Response.json({ error: { message } }, { status: 429, headers: { 'Retry-After': String(seconds) } });
}
