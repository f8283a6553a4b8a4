'use client';

import { SerwistProvider } from '@serwist/turbopack/react';
import { IS_DEVELOPMENT } from '@/lib/env-public';

/**
 * Registers the service worker (app/sw.ts) that lets field pages open without signal.
 * No reload when the signal returns: it would throw away whatever the crew is typing, and the
 * outbox sends queued taps without one.
 */
export function OfflineProvider({ children }: { children: React.ReactNode }) {
  return (
    <SerwistProvider
      swUrl="/serwist/sw.js"
      // In development pages change on every save; a worker serving yesterday's copy confuses.
      disable={IS_DEVELOPMENT}
      reloadOnOnline={false}
      options={{ scope: '/', type: 'classic' }}
    >
      {children}
    </SerwistProvider>
  );
}
