import { createHmac, timingSafeEqual } from 'node:crypto';
import { env } from '@/lib/env';

// The customer's link to a repair report: `<payload>.<signature>`, both base64url. The payload names
// the link's own row (report_links, so the office can revoke it), the job, its company and the expiry;
// the signature is HMAC-SHA256 over it with REPORT_LINK_SECRET. Nothing is looked up before the
// signature checks out, so a forged link learns nothing.

export const DEFAULT_LINK_DAYS = 30;
// r1 tokens (no link row) are no longer accepted: a link that cannot be revoked is refused.
const VERSION = 'r2';
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;

export type LinkClaims = { linkId: string; jobId: string; companyId: string; expiresAt: Date };
export type LinkCheck =
  | ({ ok: true } & LinkClaims)
  | { ok: false; reason: 'malformed' | 'signature' }
  /** Genuine but past its date: the claims may be used to name the company, nothing more. */
  | ({ ok: false; reason: 'expired' } & LinkClaims);

/** The token for a job's report, valid until `expiresAt`. */
export function signReportLink(claims: LinkClaims, secret: Buffer | string = reportLinkSecret()): string {
  if (!UUID.test(claims.linkId) || !UUID.test(claims.jobId) || !UUID.test(claims.companyId))
    throw new Error('A report link names its link row, a job and a company by id.');
  const seconds = Math.floor(claims.expiresAt.getTime() / 1000);
  if (!Number.isFinite(seconds)) throw new Error('A report link needs an expiry date.');
  const payload = Buffer.from(`${VERSION}:${claims.linkId}:${claims.jobId}:${claims.companyId}:${seconds}`).toString(
    'base64url',
  );
  return `${payload}.${mac(payload, secret)}`;
}

/** Checks a token's shape, signature (timing-safe) and expiry. */
export function verifyReportLink(
  token: string,
  now = new Date(),
  secret: Buffer | string = reportLinkSecret(),
): LinkCheck {
  if (typeof token !== 'string' || token.length > 300) return { ok: false, reason: 'malformed' };
  const parts = token.split('.');
  if (parts.length !== 2 || !BASE64URL.test(parts[0]) || !BASE64URL.test(parts[1]))
    return { ok: false, reason: 'malformed' };
  const [payload, signature] = parts;
  // Compared as text, not decoded bytes: base64url's last character carries spare bits, so two spellings
  // decode to the same bytes and a changed character must still be refused.
  const given = Buffer.from(signature, 'utf8');
  const expected = Buffer.from(mac(payload, secret), 'utf8');
  if (given.length !== expected.length || !timingSafeEqual(given, expected)) return { ok: false, reason: 'signature' };
  const fields = Buffer.from(payload, 'base64url').toString('utf8').split(':');
  if (
    fields.length !== 5 ||
    fields[0] !== VERSION ||
    !fields.slice(1, 4).every((f) => UUID.test(f)) ||
    !/^\d{1,12}$/.test(fields[4])
  ) {
    return { ok: false, reason: 'malformed' };
  }
  const claims = {
    linkId: fields[1],
    jobId: fields[2],
    companyId: fields[3],
    expiresAt: new Date(Number(fields[4]) * 1000),
  };
  if (claims.expiresAt.getTime() <= now.getTime()) return { ok: false, reason: 'expired', ...claims };
  return { ok: true, ...claims };
}

/** Expiry of a link made now: `days` ahead (30 by default). */
export const linkExpiry = (now = new Date(), days = DEFAULT_LINK_DAYS) => new Date(now.getTime() + days * 86_400_000);

/** The address the customer opens. */
export function reportLinkUrl(token: string): string {
  return `${appBaseUrl()}/r/${token}`;
}

/**
 * Where the payment provider sends the customer back: names the link row only, never the token, so
 * the provider (and its logs) never hold a key to the report. /r/back/<linkId> finds the way home.
 */
export function paymentReturnUrl(linkId: string, base = appBaseUrl()): string {
  return `${base.replace(/\/+$/, '')}/r/back/${linkId}`;
}

function appBaseUrl() {
  const e = env();
  return (e.APP_URL || e.NEXTAUTH_URL || 'http://localhost:3000').replace(/\/+$/, '');
}

/** REPORT_LINK_SECRET (lib/env): its own key, never derived from the session secret. */
function reportLinkSecret(): Buffer {
  return Buffer.from(env().REPORT_LINK_SECRET);
}

const BASE64URL = /^[A-Za-z0-9_-]+$/;
const mac = (payload: string, secret: Buffer | string) =>
  createHmac('sha256', secret).update(payload).digest('base64url');
