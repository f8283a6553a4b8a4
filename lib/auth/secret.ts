import { env } from '@/lib/env';

// The session secret comes from lib/env: required (32+ characters) outside development and test,
// a random one per process otherwise. There is no fallback secret in the code.
export function authSecret(): string {
  return env().NEXTAUTH_SECRET;
}
