'use client';

import { useEffect } from 'react';
import { IS_DEVELOPMENT } from '@/lib/env-public';

/**
 * Registers the service worker (app/sw.ts) that lets field pages open without signal.
 * No reload when the signal returns: it would throw away whatever the crew is typing, and the
 * outbox sends queued taps without one. Field pages ask the worker to keep their own copies
 * (KeepForOffline), so no window-side worker library is shipped to every page.
 */
export function OfflineProvider({ children }: { children: React.ReactNode }) {
  useEffect(() => {
    // In development pages change on every save; a worker serving yesterday's copy confuses.
    if (IS_DEVELOPMENT || !('serviceWorker' in navigator)) return;
    // A classic script, not a module worker: module workers are missing from some tablets' browsers.
    navigator.serviceWorker.register('/serwist/sw.js', { scope: '/', type: 'classic' }).catch((error: unknown) => {
      console.error('Service worker registration failed', error);
    });
  }, []);
  return children;
}
