'use client';

import { useEffect } from 'react';
import { keepForOffline } from '@/lib/client/keep-for-offline';

/**
 * Asks the service worker to keep copies of field pages and their data (app/sw.ts) as soon as it
 * runs. The page a tablet opens first after sign-in loaded before any worker was there to keep it;
 * without this it, and the installs listed on Today but not yet opened, would not open without signal.
 */
export function KeepForOffline({ urls, userId }: { urls: string[]; userId: string }) {
  const key = urls.join('\n');
  useEffect(() => {
    const controller = new AbortController();
    void keepForOffline(key.split('\n'), userId, controller.signal);
    return () => controller.abort();
  }, [key, userId]);
  return null;
}
