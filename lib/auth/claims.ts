import 'server-only';
import { cookies } from 'next/headers';
import { authSecret } from './secret';
import { decodeSessionToken } from './session-token';

// next-auth names the cookie with a __Secure- prefix when served over https.
const COOKIE_NAMES = ['__Secure-next-auth.session-token', 'next-auth.session-token'];

export type SessionClaims = { sub: string; companyId: string; role: string; tokenVersion: number };

/** The signed-in user's claims from the session cookie, or null. Verifies the JWT's encryption and expiry. */
export async function getSessionClaims(): Promise<SessionClaims | null> {
  const jar = await cookies();
  const raw = COOKIE_NAMES.map((name) => jar.get(name)?.value).find(Boolean);
  if (!raw) return null;
  try {
    const token = await decodeSessionToken(raw, authSecret());
    if (!token || typeof token.sub !== 'string' || typeof token.companyId !== 'string') return null;
    return {
      sub: token.sub,
      companyId: token.companyId,
      role: String(token.role),
      tokenVersion: Number(token.tokenVersion),
    };
  } catch {
    return null;
  }
}
