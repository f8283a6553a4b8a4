import { describe, expect, it } from 'vitest';
import { DEFAULT_LINK_DAYS, linkExpiry, signReportLink, verifyReportLink } from '@/lib/report/link';

const SECRET = 'unit-test-secret-0123456789';
const JOB = '3f2b8c1e-9a4d-4e6f-8b1a-2c3d4e5f6a7b';
const COMPANY = '7a6b5c4d-3e2f-4a1b-9c8d-7e6f5a4b3c2d';
const LINK = '0c9d8e7f-6a5b-4c3d-8e2f-1a0b9c8d7e6f';
const NOW = new Date('2026-12-01T12:00:00Z');
const claims = { linkId: LINK, jobId: JOB, companyId: COMPANY, expiresAt: linkExpiry(NOW) };

describe('report links', () => {
  it('verifies what it signed, until the expiry (30 days by default)', () => {
    const token = signReportLink(claims, SECRET);
    expect(verifyReportLink(token, NOW, SECRET)).toEqual({ ok: true, ...claims });
    expect(claims.expiresAt.getTime() - NOW.getTime()).toBe(DEFAULT_LINK_DAYS * 86_400_000);
    const justBefore = new Date(claims.expiresAt.getTime() - 1000);
    expect(verifyReportLink(token, justBefore, SECRET).ok).toBe(true);
    expect(verifyReportLink(token, claims.expiresAt, SECRET)).toEqual({ ok: false, reason: 'expired', ...claims });
  });

  it('refuses another secret, a changed signature, a changed payload and junk', () => {
    const token = signReportLink(claims, SECRET);
    const [payload, signature] = token.split('.');
    expect(verifyReportLink(token, NOW, 'another-secret-0123456789')).toEqual({ ok: false, reason: 'signature' });
    const flipped = signature[0] === 'A' ? `B${signature.slice(1)}` : `A${signature.slice(1)}`;
    expect(verifyReportLink(`${payload}.${flipped}`, NOW, SECRET)).toEqual({ ok: false, reason: 'signature' });
    // Every other spelling of the last character: some decode to the very same bytes (base64url's spare
    // bits), and each must still be refused — the link is compared as written.
    const alphabet = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789-_';
    for (const c of alphabet.replace(signature.at(-1)!, '')) {
      expect(verifyReportLink(`${payload}.${signature.slice(0, -1)}${c}`, NOW, SECRET).ok).toBe(false);
    }
    const later = Buffer.from(Buffer.from(payload, 'base64url').toString().replace(/\d+$/, '9999999999')).toString(
      'base64url',
    );
    expect(verifyReportLink(`${later}.${signature}`, NOW, SECRET)).toEqual({ ok: false, reason: 'signature' });
    expect(verifyReportLink(`${payload}.${signature.slice(0, -4)}`, NOW, SECRET)).toEqual({
      ok: false,
      reason: 'signature',
    });
    for (const junk of ['', '.', 'abc', `${payload}.${signature}.x`, `${payload}.sig+/=`, 'a'.repeat(400)]) {
      expect(verifyReportLink(junk, NOW, SECRET)).toEqual({ ok: false, reason: 'malformed' });
    }
  });

  it('refuses a well-signed payload that is not a report claim', async () => {
    const { createHmac } = await import('node:crypto');
    const sign = (text: string) => {
      const payload = Buffer.from(text).toString('base64url');
      return `${payload}.${createHmac('sha256', SECRET).update(payload).digest('base64url')}`;
    };
    expect(verifyReportLink(sign(`r2:${LINK}:not-a-uuid:${COMPANY}:9999999999`), NOW, SECRET)).toEqual({
      ok: false,
      reason: 'malformed',
    });
    // The earlier form without a link row cannot be revoked, so it is refused even when well signed.
    expect(verifyReportLink(sign(`r1:${JOB}:${COMPANY}:9999999999`), NOW, SECRET)).toEqual({
      ok: false,
      reason: 'malformed',
    });
    expect(verifyReportLink(sign(`r2:${LINK}:${JOB}:${COMPANY}:9999999999`), NOW, SECRET)).toEqual({
      ok: true,
      ...claims,
      expiresAt: new Date(9_999_999_999_000),
    });
  });

  it('only signs ids and real dates', () => {
    expect(() => signReportLink({ ...claims, jobId: 'x' }, SECRET)).toThrow();
    expect(() => signReportLink({ ...claims, linkId: 'x' }, SECRET)).toThrow();
    expect(() => signReportLink({ ...claims, expiresAt: new Date(Number.NaN) }, SECRET)).toThrow();
  });
});
