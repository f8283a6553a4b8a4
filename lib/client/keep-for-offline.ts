// Asks the service worker (app/sw.ts) to fetch and keep field pages and their data, through the
// same cache rules as any other request (lib/client/cache-rules.ts decides what is kept).

/** A page kept this recently is not fetched again on the next visit (each page visit refreshes its own copy anyway). */
export const KEEP_AGAIN_AFTER_MS = 5 * 60_000;
const STORE_KEY = 'setline-kept-for-offline';
// A worker that never answers (an old one, a busy tablet) must not hold the page's effect forever.
const ANSWER_TIMEOUT_MS = 60_000;

/**
 * Sends the addresses not kept in the last few minutes to the active worker ("CACHE_URLS", which
 * serwist answers on the message port once every request has finished). Resolves with the
 * addresses sent; never throws (without a worker there is nothing to keep them).
 */
export async function keepForOffline(urls: string[], owner: string, signal?: AbortSignal): Promise<string[]> {
  if (typeof navigator === 'undefined' || !('serviceWorker' in navigator)) return [];
  try {
    const registration = await navigator.serviceWorker.ready;
    const worker = registration.active;
    if (!worker || signal?.aborted) return [];
    const kept = readKept(owner);
    const now = Date.now();
    const due = [...new Set(urls)].filter((url) => url && !(now - (kept[url] ?? 0) < KEEP_AGAIN_AFTER_MS));
    if (due.length === 0) return [];
    await ask(worker, due);
    // Only what the worker really stored counts as kept (it stores nothing just after a sign-out).
    const fresh = readKept(owner);
    for (const url of due) if (await caches.match(url, { ignoreVary: true })) fresh[url] = Date.now();
    writeKept(owner, fresh);
    return due;
  } catch {
    return [];
  }
}

function ask(worker: ServiceWorker, urls: string[]): Promise<boolean> {
  return new Promise((resolve) => {
    const channel = new MessageChannel();
    const timer = setTimeout(() => resolve(false), ANSWER_TIMEOUT_MS);
    channel.port1.onmessage = () => {
      clearTimeout(timer);
      resolve(true);
    };
    worker.postMessage({ type: 'CACHE_URLS', payload: { urlsToCache: urls } }, [channel.port2]);
  });
}

// Per user: a sign-out drops the copies, so the next user's pages must not count as kept.
function readKept(owner: string): Record<string, number> {
  try {
    const value: unknown = JSON.parse(sessionStorage.getItem(`${STORE_KEY}:${owner}`) ?? '{}');
    return typeof value === 'object' && value !== null ? (value as Record<string, number>) : {};
  } catch {
    return {};
  }
}

function writeKept(owner: string, kept: Record<string, number>) {
  try {
    sessionStorage.setItem(`${STORE_KEY}:${owner}`, JSON.stringify(kept));
  } catch {
    // Storage full or refused: the next visit simply asks again.
  }
}
