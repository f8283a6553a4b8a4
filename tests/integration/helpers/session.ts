import { AsyncLocalStorage } from 'node:async_hooks';
import { encode } from 'next-auth/jwt';
import { authSecret } from '@/lib/auth/secret';

export const cookieJar = new Map<string, string>();

// Tests that run concurrently (the fuzz suite) each keep their own jar for the requests they make.
const jars = new AsyncLocalStorage<Map<string, string>>();

/** The jar next/headers reads: the one of the running `withSession`, else the shared one. */
export const currentJar = () => jars.getStore() ?? cookieJar;

/** Runs `fn` with a session of its own for `user`, leaving the shared jar alone. */
export async function withSession<T>(user: Signable, fn: () => Promise<T>): Promise<T> {
  const jar = new Map([['next-auth.session-token', await tokenOf(user)]]);
  return jars.run(jar, fn);
}

const tokenOf = (user: Signable) =>
  encode({
    token: { sub: user.id, companyId: user.companyId, role: user.role, tokenVersion: user.tokenVersion } as never,
    secret: authSecret(),
  });

type Signable = { id: string; companyId: string; role: string; tokenVersion: number };

/** Puts a real next-auth session cookie for the user in the jar, as the browser would send it. */
export async function signInAs(user: Signable) {
  const token = await tokenOf(user);
  cookieJar.clear();
  cookieJar.set('next-auth.session-token', token);
}

export function signOut() {
  cookieJar.clear();
}
