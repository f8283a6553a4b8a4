import 'server-only';
import { NextRequest } from 'next/server';
import { AppError } from '@/lib/server/errors';
import { readBodyText } from '@/lib/server/http';
import {
  clientIp,
  recordSignInFailure,
  recordSignInSuccess,
  signInLockedFor,
  tooManyAttempts,
} from '@/lib/security/throttle';

const SESSION_COOKIE = /(^|,\s*)(__Secure-)?next-auth\.session-token=/;

/**
 * Wraps next-auth's credentials callback (POST /api/auth/callback/credentials). A locked e-mail or
 * address answers 429 before next-auth runs, so even the right password creates no session; next-auth's
 * answer then tells a failure (401) from a success (a session cookie), which are counted.
 */
export async function throttledCredentialsSignIn(
  request: NextRequest,
  run: (request: NextRequest) => Promise<Response>,
): Promise<Response> {
  let text: string;
  try {
    text = await readBodyText(request);
  } catch (error) {
    if (error instanceof AppError)
      return Response.json({ error: { message: error.message } }, { status: error.status });
    throw error;
  }
  const email = emailOf(text, request.headers.get('content-type'));
  const ip = clientIp(request.headers);

  const locked = await signInLockedFor(email, ip);
  if (locked !== null) return tooManyAttempts(locked);

  // The body was read to learn the e-mail: next-auth gets an identical request to read it again.
  const response = await run(
    new NextRequest(request.url, { method: request.method, headers: request.headers, body: text }),
  );
  if (response.status === 401) {
    const lock = await recordSignInFailure(email, ip);
    if (lock !== null) return tooManyAttempts(lock);
  } else if (response.ok && email && SESSION_COOKIE.test(response.headers.get('set-cookie') ?? '')) {
    await recordSignInSuccess(email);
  }
  return response;
}

/** The e-mail the attempt is for (form-encoded as next-auth's client sends it, or JSON), or null. */
function emailOf(text: string, contentType: string | null): string | null {
  let value: unknown;
  if (contentType?.includes('application/json')) {
    try {
      value = (JSON.parse(text) as { email?: unknown })?.email;
    } catch {
      value = undefined;
    }
  } else {
    value = new URLSearchParams(text).get('email');
  }
  return typeof value === 'string' && value.trim() ? value : null;
}
