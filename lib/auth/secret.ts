// A fixed development secret keeps `npm run dev` and the tests working; a production server
// refuses to start signing sessions without its own NEXTAUTH_SECRET.
const DEV_SECRET = 'setline-development-secret-not-for-production';

export function authSecret(): string {
  const secret = process.env.NEXTAUTH_SECRET;
  if (secret) return secret;
  if (process.env.NODE_ENV === 'production' && process.env.NEXT_PHASE !== 'phase-production-build') {
    throw new Error('NEXTAUTH_SECRET is required in production');
  }
  return DEV_SECRET;
}
