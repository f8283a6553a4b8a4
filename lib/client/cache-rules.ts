// Which requests the service worker (app/sw.ts) keeps a copy of, and how. Pure, so the
// choice can be tested without a browser.

/** Set by the service worker on an answer it took from its cache instead of the network. */
export const FROM_CACHE_HEADER = 'x-setline-from-cache';

export type CacheRule =
  /** Field pages: the network's answer, the last copy without signal. */
  | 'page'
  /** The React Server Component payload of a field page (client-side navigation). */
  | 'page-data'
  /** The install and today's-list API reads: the network's answer, the last copy without signal. */
  | 'api'
  /** Hashed build files: never change under the same name, so the copy is always right. */
  | 'static'
  /** Unhashed files from public/: the copy at once, refreshed behind it. */
  | 'public-file'
  /** Left alone: the browser goes to the network as if there were no service worker. */
  | 'none';

export interface RequestFacts {
  url: URL;
  method: string;
  /** Whether the request goes to the page's own origin. */
  sameOrigin: boolean;
  /** Request headers (only `RSC` is read). */
  headers: { get(name: string): string | null };
}

const FIELD_PAGES = [/^\/today(?:\/|$)/, /^\/installs\/[^/]+/];
const FIELD_APIS = [/^\/api\/installs(?:\/|$)/, /^\/api\/today/];

export function cacheRuleFor({ url, method, sameOrigin, headers }: RequestFacts): CacheRule {
  // Writes are never answered from a cache: a tap answered by a copy would look sent.
  if (method !== 'GET' || !sameOrigin) return 'none';
  const path = url.pathname;
  if (path.startsWith('/api/')) return FIELD_APIS.some((re) => re.test(path)) ? 'api' : 'none';
  if (path.startsWith('/_next/static/')) return 'static';
  if (FIELD_PAGES.some((re) => re.test(path))) return headers.get('RSC') === '1' ? 'page-data' : 'page';
  if (path.startsWith('/serwist/')) return 'none';
  if (/^\/[^/]+\.(?:ico|png|svg|webp|jpg|jpeg|webmanifest|woff2?)$/i.test(path)) return 'public-file';
  return 'none';
}
