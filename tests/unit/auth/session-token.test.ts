import { encode, decode } from 'next-auth/jwt';
import { describe, expect, it } from 'vitest';
import { decodeSessionToken } from '@/lib/auth/session-token';

// Our decoder of the session cookie against next-auth's own encode and decode (next-auth 4, next-auth/jwt).
const SECRET = 'unit-test-session-secret-0123456789abcdef';
const claims = { sub: 'u1', companyId: 'c1', role: 'foreman' as const, tokenVersion: 3 };

describe('decodeSessionToken', () => {
  it("reads what next-auth's encode wrote, as next-auth's decode does", async () => {
    const token = await encode({ token: claims, secret: SECRET });
    const ours = await decodeSessionToken(token, SECRET);
    expect(ours).toEqual(await decode({ token, secret: SECRET }));
    expect(ours).toMatchObject(claims);
    // The key is kept per secret: a second token under the same secret, and one under another, both read right.
    expect(
      await decodeSessionToken(await encode({ token: { ...claims, sub: 'u2' }, secret: SECRET }), SECRET),
    ).toMatchObject({ sub: 'u2' });
    const other = `${SECRET}-other`;
    expect(await decodeSessionToken(await encode({ token: claims, secret: other }), other)).toMatchObject(claims);
  });

  it('refuses a token under another secret, an altered token and an expired one', async () => {
    const token = await encode({ token: claims, secret: SECRET });
    await expect(decodeSessionToken(token, `${SECRET}-x`)).rejects.toThrow();
    const parts = token.split('.');
    parts[3] = parts[3].slice(0, -2) + (parts[3].endsWith('AA') ? 'BB' : 'AA');
    await expect(decodeSessionToken(parts.join('.'), SECRET)).rejects.toThrow();
    const expired = await encode({ token: claims, secret: SECRET, maxAge: -60 });
    await expect(decodeSessionToken(expired, SECRET)).rejects.toThrow();
  });
});
