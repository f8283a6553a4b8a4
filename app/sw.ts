/// <reference lib="webworker" />
// The service worker: bundled by esbuild and served by app/serwist/[path]/route.ts.
import {
  CacheFirst,
  ExpirationPlugin,
  NetworkFirst,
  Serwist,
  StaleWhileRevalidate,
  type PrecacheEntry,
  type RouteMatchCallback,
  type SerwistPlugin,
} from 'serwist';
import { cacheRuleFor, FROM_CACHE_HEADER, type CacheRule } from '@/lib/client/cache-rules';
import { offlinePageResponse } from '@/lib/client/offline-page';

declare global {
  interface WorkerGlobalScope {
    __SW_MANIFEST: (PrecacheEntry | string)[] | undefined;
  }
}

declare const self: ServiceWorkerGlobalScope;

const CACHES = {
  pages: 'setline-pages',
  pageData: 'setline-page-data',
  api: 'setline-api',
  static: 'setline-static',
  public: 'setline-public',
  previousBuild: 'setline-previous-build',
};
const DAY_S = 24 * 3600;
// On a weak signal a request can hang far longer than a crew will wait; after this the last
// copy is shown (the request still finishes in the background and refreshes the copy).
const NETWORK_TIMEOUT_S = 6;
// After a sign-out nothing is stored for this long (see the sign-out listener below).
const SIGN_OUT_QUIET_MS = 10_000;
let signedOutAt = -Infinity;

const matches =
  (rule: CacheRule): RouteMatchCallback =>
  ({ url, request, sameOrigin }) =>
    cacheRuleFor({ url, method: request.method, sameOrigin, headers: request.headers }) === rule;

// Only a whole, direct 200 is kept: a redirect to /sign-in (session over) must not be stored
// under the page's own address.
const onlyComplete: SerwistPlugin = {
  cacheWillUpdate: async ({ response }) =>
    response.status === 200 && !response.redirected && Date.now() - signedOutAt > SIGN_OUT_QUIET_MS ? response : null,
};

// Tells the page an answer is a stored copy: its Date header is old, so the clock must not
// learn from it (lib/client/fetch-json.ts), and the data may be stale.
const markCopy: SerwistPlugin = {
  cachedResponseWillBeUsed: async ({ cachedResponse }) => {
    if (!cachedResponse) return cachedResponse;
    const headers = new Headers(cachedResponse.headers);
    headers.set(FROM_CACHE_HEADER, '1');
    return new Response(cachedResponse.body, {
      status: cachedResponse.status,
      statusText: cachedResponse.statusText,
      headers,
    });
  },
};

const offlineFallback: SerwistPlugin = { handlerDidError: async () => offlinePageResponse() };

// A page kept from before a deploy still names the old build's scripts (see keepPreviousBuild).
const previousBuildFallback: SerwistPlugin = {
  cachedResponseWillBeUsed: async ({ request, cachedResponse }) =>
    cachedResponse ?? (await caches.match(request, { cacheName: CACHES.previousBuild })) ?? null,
};

const expire = (maxEntries: number, days: number) =>
  new ExpirationPlugin({ maxEntries, maxAgeSeconds: days * DAY_S, purgeOnQuotaError: true });

// Next varies page answers on router headers; the RSC payloads are in a cache of their own
// (and carry `_rsc` in the URL), so the copy of a page may match any plain request for it.
const matchOptions = { ignoreVary: true };

const serwist = new Serwist({
  precacheEntries: self.__SW_MANIFEST,
  precacheOptions: {
    cleanupOutdatedCaches: true,
    // /sign-in is precached; the redirect to it adds ?callbackUrl=…
    ignoreURLParametersMatching: [/^utm_/, /^callbackUrl$/],
  },
  skipWaiting: true,
  clientsClaim: true,
  runtimeCaching: [
    {
      matcher: matches('page'),
      handler: new NetworkFirst({
        cacheName: CACHES.pages,
        networkTimeoutSeconds: NETWORK_TIMEOUT_S,
        matchOptions,
        plugins: [onlyComplete, expire(100, 7), offlineFallback],
      }),
    },
    {
      matcher: matches('page-data'),
      handler: new NetworkFirst({
        cacheName: CACHES.pageData,
        networkTimeoutSeconds: NETWORK_TIMEOUT_S,
        matchOptions,
        plugins: [onlyComplete, expire(100, 7)],
      }),
    },
    {
      matcher: matches('api'),
      handler: new NetworkFirst({
        cacheName: CACHES.api,
        networkTimeoutSeconds: NETWORK_TIMEOUT_S,
        matchOptions,
        plugins: [onlyComplete, markCopy, expire(200, 7)],
      }),
    },
    {
      matcher: matches('static'),
      handler: new CacheFirst({
        cacheName: CACHES.static,
        plugins: [onlyComplete, expire(300, 30), previousBuildFallback],
      }),
    },
    {
      matcher: matches('public-file'),
      handler: new StaleWhileRevalidate({ cacheName: CACHES.public, plugins: [onlyComplete, expire(50, 30)] }),
    },
  ],
});

// A shared tablet: what one person's pages and reads showed must not open offline for the
// next. The copies go once the sign-out has gone through; reads still in flight then would
// store the old session's answers again, so nothing is stored for a short while after. The
// outbox (IndexedDB) is left alone — unsent taps are never thrown away.
self.addEventListener('fetch', (event) => {
  const url = new URL(event.request.url);
  if (event.request.method !== 'POST' || url.origin !== self.location.origin || url.pathname !== '/api/auth/signout')
    return;
  event.respondWith(
    fetch(event.request).then(async (response) => {
      signedOutAt = Date.now();
      await Promise.all([CACHES.pages, CACHES.pageData, CACHES.api].map((name) => caches.delete(name)));
      return response;
    }),
  );
});

// serwist.addEventListeners(), except that activation first keeps the old build's files.
self.addEventListener('install', serwist.handleInstall);
self.addEventListener('activate', (event) =>
  event.waitUntil(keepPreviousBuild().then(() => serwist.handleActivate(event))),
);
self.addEventListener('fetch', serwist.handleFetch);
self.addEventListener('message', serwist.handleCache);

/**
 * A new worker drops the old build's scripts from the precache. A page copy kept from before
 * the deploy (opened later without signal) still names them, and would show without working
 * buttons. So the outgoing build's static files move to a cache of their own (one build back,
 * so it cannot grow), and the RSC payloads, which name chunks too, are dropped.
 */
async function keepPreviousBuild(): Promise<void> {
  const current = new Set(
    (self.__SW_MANIFEST ?? []).map(
      (entry) => new URL(typeof entry === 'string' ? entry : entry.url, self.location.origin).href,
    ),
  );
  const precache = await caches.open(serwist.precacheStrategy.cacheName);
  const outgoing = (await precache.keys()).filter(
    (request) => new URL(request.url).pathname.startsWith('/_next/static/') && !current.has(request.url),
  );
  if (outgoing.length === 0) return;
  await Promise.all([caches.delete(CACHES.previousBuild), caches.delete(CACHES.pageData)]);
  const previous = await caches.open(CACHES.previousBuild);
  for (const request of outgoing) {
    const response = await precache.match(request);
    if (response) await previous.put(request, response);
  }
}
