import { createHmac, timingSafeEqual } from 'node:crypto';
import { env } from '@/lib/env';

// The customer's link to a repair report: `<payload>.<signature>`, both base64url. The payload names
// the job, its company and the expiry; the signature is HMAC-SHA256 over it with a server secret.
// Nothing is looked up before the signature checks out, so a forged link learns nothing.

export const DEFAULT_LINK_DAYS = 30;
const VERSION = 'r1';
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;

export type LinkClaims = { jobId: string; companyId: string; expiresAt: Date };
export type LinkCheck =
  | ({ ok: true } & LinkClaims)
  | { ok: false; reason: 'malformed' | 'signature' }
  /** Genuine but past its date: the claims may be used to name the company, nothing more. */
  | ({ ok: false; reason: 'expired' } & LinkClaims);

/** The token for a job's report, valid until `expiresAt`. */
export function signReportLink(claims: LinkClaims, secret: Buffer | string = reportLinkSecret()): string {
  if (!UUID.test(claims.jobId) || !UUID.test(claims.companyId)) throw new Error('A report link names a job and a company by id.');
  const seconds = Math.floor(claims.expiresAt.getTime() / 1000);
  if (!Number.isFinite(seconds)) throw new Error('A report link needs an expiry date.');
  const payload = Buffer.from(`${VERSION}:${claims.jobId}:${claims.companyId}:${seconds}`).toString('base64url');
  return `${payload}.${mac(payload, secret)}`;
}

/** Checks a token's shape, signature (timing-safe) and expiry. */
export function verifyReportLink(token: string, now = new Date(), secret: Buffer | string = reportLinkSecret()): LinkCheck {
  if (typeof token !== 'string' || token.length > 300) return { ok: false, reason: 'malformed' };
  const parts = token.split('.');
  if (parts.length !== 2 || !BASE64URL.test(parts[0]) || !BASE64URL.test(parts[1])) return { ok: false, reason: 'malformed' };
  const [payload, signature] = parts;
  // Compared as text, not decoded bytes: base64url's last character carries spare bits, so two spellings
  // decode to the same bytes and a changed character must still be refused.
  const given = Buffer.from(signature, 'utf8');
  const expected = Buffer.from(mac(payload, secret), 'utf8');
  if (given.length !== expected.length || !timingSafeEqual(given, expected)) return { ok: false, reason: 'signature' };
  const fields = Buffer.from(payload, 'base64url').toString('utf8').split(':');
  if (fields.length !== 4 || fields[0] !== VERSION || !UUID.test(fields[1]) || !UUID.test(fields[2]) || !/^\d{1,12}$/.test(fields[3])) {
    return { ok: false, reason: 'malformed' };
  }
  const claims = { jobId: fields[1], companyId: fields[2], expiresAt: new Date(Number(fields[3]) * 1000) };
  if (claims.expiresAt.getTime() <= now.getTime()) return { ok: false, reason: 'expired', ...claims };
  return { ok: true, ...claims };
}

/** Expiry of a link made now: `days` ahead (30 by default). */
export const linkExpiry = (now = new Date(), days = DEFAULT_LINK_DAYS) => new Date(now.getTime() + days * 86_400_000);

/** The address the customer opens. */
export function reportLinkUrl(token: string): string {
  const e = env();
  const base = e.APP_URL || e.NEXTAUTH_URL || 'http://localhost:3000';
  return `${base.replace(/\/+$/, '')}/r/${token}`;
}

/** REPORT_LINK_SECRET (lib/env): its own key, never derived from the session secret. */
export function reportLinkSecret(): Buffer {
  return Buffer.from(env().REPORT_LINK_SECRET);
}

const BASE64URL = /^[A-Za-z0-9_-]+$/;
const mac = (payload: string, secret: Buffer | string) => createHmac('sha256', secret).update(payload).digest('base64url');
