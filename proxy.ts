import { NextResponse, type NextRequest } from 'next/server';
import { getToken, type JWT } from 'next-auth/jwt';
import { decodeSessionToken } from '@/lib/auth/session-token';
import { authSecret } from '@/lib/auth/secret';
import { IS_DEVELOPMENT } from '@/lib/env-public';
import { MAX_BODY_BYTES } from '@/lib/server/http-limits';
import {
  DOCUMENT_POLICY,
  contentSecurityPolicy,
  crossSiteRefusal,
  ownOrigins,
  securityHeaders,
  servedOverHttps,
} from '@/lib/security/headers';
import { clientIp, reportLinkLimited, tooManyAttempts } from '@/lib/security/throttle';

// Runs before every request except the build's static files. It is never the authorization check:
// every page, route handler and server action calls requireUser itself. Here:
// - refuses what must not reach a route: a declared body over 1 MB (413), a cross-site write to the
//   API (403), more than 60 requests a minute from one address to a customer's report link (429);
// - sends signed-out visitors of app pages to /sign-in;
// - gives every response its security headers, and pages a Content-Security-Policy with a fresh
//   script nonce (Next reads it from the request's CSP header and puts it on its own scripts).

// The pages a signed-out visitor is sent away from (everything but the API, sign-in, the 403 page,
// the customer's report link and files with an extension).
const NEEDS_SESSION = /^\/(?!api(\/|$)|_next\/|sign-in(\/|$)|forbidden(\/|$)|favicon|r\/).*$/;
const HAS_EXTENSION = /\.[a-z0-9]+$/i;

export async function proxy(request: NextRequest) {
  const { pathname, search } = request.nextUrl;
  const https = servedOverHttps(request);
  const finish = (response: NextResponse | Response, policy?: string) => {
    for (const [name, value] of Object.entries(securityHeaders(pathname, https))) response.headers.set(name, value);
    if (policy) response.headers.set('Content-Security-Policy', policy);
    return response;
  };
  const refuse = (status: number, message: string) =>
    finish(NextResponse.json({ error: { message } }, { status }), DOCUMENT_POLICY);

  const declared = Number(request.headers.get('content-length'));
  if (Number.isFinite(declared) && declared > MAX_BODY_BYTES)
    return refuse(413, `The request body is larger than ${MAX_BODY_BYTES / 1024} KB.`);

  const crossSite = crossSiteRefusal(request, ownOrigins(request));
  if (crossSite) return refuse(403, crossSite);

  if (pathname.startsWith('/r/')) {
    const wait = await reportLinkLimited(clientIp(request.headers)).catch((error: unknown) => {
      // The limit is a guard, not the link check: a store outage must not take the customer's report down.
      console.error('[throttle] report-link limit not checked', error instanceof Error ? error.message : error);
      return null;
    });
    if (wait !== null) return finish(tooManyAttempts(wait), DOCUMENT_POLICY);
  }

  if (NEEDS_SESSION.test(pathname) && !HAS_EXTENSION.test(pathname)) {
    const token = await getToken({
      req: request,
      secret: authSecret(),
      // The key derived once per secret (lib/auth/session-token.ts), not again on every page request.
      decode: ({ token: raw, secret }) => (raw ? (decodeSessionToken(raw, String(secret)) as Promise<JWT>) : null),
    });
    if (!token) {
      const signIn = new URL('/sign-in', request.url);
      signIn.searchParams.set('callbackUrl', `${pathname}${search}`);
      return finish(NextResponse.redirect(signIn));
    }
  }

  // The PDF runs no script: it gets a policy without a nonce (and the browser's viewer keeps working).
  if (/^\/r\/[^/]+\/pdf$/.test(pathname) || pathname.startsWith('/api/'))
    return finish(NextResponse.next(), DOCUMENT_POLICY);

  const nonce = Buffer.from(crypto.randomUUID()).toString('base64');
  const policy = contentSecurityPolicy(nonce, { dev: IS_DEVELOPMENT, https });
  const requestHeaders = new Headers(request.headers);
  requestHeaders.set('x-nonce', nonce);
  requestHeaders.set('Content-Security-Policy', policy);
  return finish(NextResponse.next({ request: { headers: requestHeaders } }), policy);
}

export const config = {
  // Everything but the build's hashed static files and image optimizer (next.config.mjs gives those
  // their headers).
  matcher: ['/((?!_next/static|_next/image).*)'],
};
