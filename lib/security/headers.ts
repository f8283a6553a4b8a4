import { env, storageEnv, type Env } from '@/lib/env';

// The security headers of every response and the cross-site rule for the API, as pure functions of the
// request and the environment (proxy.ts applies them; tests call them directly too).

/** Origins the browser talks to besides the app: evidence storage (uploads PUT there, images and videos read from it). */
export function storageOrigins(e: Env = env()): string[] {
  let storage: ReturnType<typeof storageEnv>;
  try {
    storage = storageEnv(e);
  } catch {
    return []; // storage not set up yet: nothing extra allowed
  }
  if (storage.endpoint) {
    const origin = new URL(storage.endpoint).origin;
    // Virtual-host addressing puts the bucket in the host name.
    return storage.forcePathStyle
      ? [origin]
      : [origin, new URL(storage.endpoint).origin.replace('://', `://${storage.bucket}.`)];
  }
  return [`https://${storage.bucket}.s3.${storage.region}.amazonaws.com`, `https://s3.${storage.region}.amazonaws.com`];
}

/** Where "Pay now" sends the browser (a form post answered with a redirect, which form-action also governs). */
function checkoutOrigin(e: Env = env()): string {
  if (e.PAYMENT_CHECKOUT_ORIGIN) return new URL(e.PAYMENT_CHECKOUT_ORIGIN).origin;
  if (e.STRIPE_API_URL) return new URL(e.STRIPE_API_URL).origin;
  return 'https://checkout.stripe.com';
}

/**
 * The Content-Security-Policy of a page: scripts only with this request's nonce (and what they load,
 * 'strict-dynamic'); no plugins, no framing, no foreign base or form targets; images, media and
 * fetches only from the app and the storage origin. Styles allow inline attributes (React style props).
 */
export function contentSecurityPolicy(
  nonce: string,
  options: { dev?: boolean; https?: boolean; e?: Env } = {},
): string {
  const e = options.e ?? env();
  const storage = storageOrigins(e).join(' ');
  const directives = [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${options.dev ? " 'unsafe-eval'" : ''}`,
    "style-src 'self' 'unsafe-inline'",
    `img-src 'self' blob: data: ${storage}`,
    `media-src 'self' blob: ${storage}`,
    "font-src 'self' data:",
    `connect-src 'self' ${storage}`,
    "worker-src 'self'",
    "manifest-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    `form-action 'self' ${checkoutOrigin(e)}`,
    "frame-ancestors 'none'",
    ...(options.https ? ['upgrade-insecure-requests'] : []),
  ];
  return directives.map((d) => d.replace(/\s+/g, ' ').trim()).join('; ');
}

/** The policy of a document that runs nothing (the report PDF): no scripts, no plugins beyond the viewer, no framing. */
export const DOCUMENT_POLICY =
  "default-src 'none'; img-src 'self' data:; style-src 'unsafe-inline'; base-uri 'none'; form-action 'none'; frame-ancestors 'none'";

/** Camera for the app itself (inspection photos and videos); the rest of the powerful features off. */
export const PERMISSIONS_POLICY =
  'camera=(self), microphone=(), geolocation=(), payment=(), usb=(), serial=(), bluetooth=(), midi=(), magnetometer=(), gyroscope=(), ' +
  'accelerometer=(), display-capture=(), interest-cohort=()';

/** True when the request reached us over https (directly, or per the proxy's X-Forwarded-Proto), or the public address is https. */
export function servedOverHttps(request: { url: string; headers: Headers }, e: Env = env()): boolean {
  if (new URL(request.url).protocol === 'https:') return true;
  if (request.headers.get('x-forwarded-proto')?.split(',')[0].trim().toLowerCase() === 'https') return true;
  return !!e.NEXTAUTH_URL && new URL(e.NEXTAUTH_URL).protocol === 'https:';
}

/** Every header but the CSP, for a response to `pathname`. */
export function securityHeaders(pathname: string, https: boolean): Record<string, string> {
  return {
    'X-Content-Type-Options': 'nosniff',
    // The customer's report link is a bearer token in the path: never sent on as a referrer.
    'Referrer-Policy':
      pathname === '/r' || pathname.startsWith('/r/') ? 'no-referrer' : 'strict-origin-when-cross-origin',
    'Permissions-Policy': PERMISSIONS_POLICY,
    'X-Frame-Options': 'DENY',
    ...(https ? { 'Strict-Transport-Security': 'max-age=31536000; includeSubDomains' } : {}),
  };
}

const MUTATING = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

/**
 * The API's cross-site rule: a mutating request to /api/* (except next-auth's own routes, which check
 * their CSRF token, and the payment webhook, which checks its signature) is refused when the browser
 * says it is cross-site, or when its Origin — or, without one, its Referer — is not one of ours.
 * Requests with none of these (non-browser clients) pass. Returns the refusal message or null.
 */
export function crossSiteRefusal(
  request: { method: string; url: string; headers: Headers },
  ownOrigins: string[],
): string | null {
  if (!MUTATING.has(request.method.toUpperCase())) return null;
  const { pathname } = new URL(request.url);
  if (!pathname.startsWith('/api/') || pathname.startsWith('/api/auth/') || pathname === '/api/payments/webhook')
    return null;
  const refusal = 'This request came from another site and was refused.';
  if (request.headers.get('sec-fetch-site')?.toLowerCase() === 'cross-site') return refusal;
  const origin = request.headers.get('origin');
  const source = origin ?? request.headers.get('referer');
  if (source === null) return null;
  let sourceOrigin: string;
  try {
    sourceOrigin = new URL(source).origin; // "null" (opaque) and garbage never match
  } catch {
    return refusal;
  }
  return ownOrigins.includes(sourceOrigin) ? null : refusal;
}

/**
 * The app's own origins: its configured public addresses, and the address this request was sent to
 * (a browser's cross-site request names our host but another Origin, so comparing with the host is safe).
 */
export function ownOrigins(request: { url: string; headers: Headers }, e: Env = env()): string[] {
  const origins = new Set<string>();
  for (const url of [e.NEXTAUTH_URL, e.APP_URL]) if (url) origins.add(new URL(url).origin);
  const host = request.headers.get('host');
  const protocol = new URL(request.url).protocol;
  origins.add(new URL(request.url).origin);
  if (host) {
    try {
      origins.add(new URL(`${protocol}//${host}`).origin);
    } catch {
      // a malformed Host names nothing of ours
    }
  }
  return [...origins];
}
