import { encode } from 'next-auth/jwt';
import { authSecret } from '@/lib/auth/secret';

export const cookieJar = new Map<string, string>();

type Signable = { id: string; companyId: string; role: string; tokenVersion: number };

/** Puts a real next-auth session cookie for the user in the jar, as the browser would send it. */
export async function signInAs(user: Signable) {
  const token = await encode({
    token: { sub: user.id, companyId: user.companyId, role: user.role, tokenVersion: user.tokenVersion } as never,
    secret: authSecret(),
  });
  cookieJar.clear();
  cookieJar.set('next-auth.session-token', token);
}

export function signOut() {
  cookieJar.clear();
}
