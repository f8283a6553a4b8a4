import type { NextRequest } from 'next/server';
import NextAuth from 'next-auth';
import { authOptions } from '@/lib/auth/options';
import { throttledCredentialsSignIn } from '@/lib/auth/sign-in-throttle';

type Context = { params: Promise<{ nextauth: string[] }> };

const handler = NextAuth(authOptions) as (request: NextRequest, context: Context) => Promise<Response>;

export const GET = handler;

/** Password sign-ins go through the attempt limits (lib/auth/sign-in-throttle.ts); every other action is next-auth's. */
export async function POST(request: NextRequest, context: Context) {
  const [action, provider] = (await context.params).nextauth ?? [];
  if (action === 'callback' && provider === 'credentials') {
    return throttledCredentialsSignIn(request, (forwarded) => handler(forwarded, context));
  }
  return handler(request, context);
}
