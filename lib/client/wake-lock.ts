'use client';

import { useEffect } from 'react';

/**
 * Keeps the screen on while `active` (a clock is running): a tablet that dims and locks at the
 * manhole hides the countdown and, on many devices, silences the page's alarms. The browser
 * drops the lock whenever the page is hidden, so it is asked for again each time the page is
 * back in view. Does nothing where the Screen Wake Lock API is missing.
 */
export function useWakeLock(active: boolean): void {
  useEffect(() => {
    if (!active || typeof navigator === 'undefined' || !('wakeLock' in navigator)) return;
    let sentinel: WakeLockSentinel | null = null;
    let released = false;

    const acquire = async () => {
      if (released || document.visibilityState !== 'visible' || (sentinel && !sentinel.released)) return;
      try {
        const lock = await navigator.wakeLock.request('screen');
        // The effect may have been cleaned up while the request was pending.
        if (released) void lock.release().catch(() => undefined);
        else sentinel = lock;
      } catch {
        // Refused (battery saver, no user activation yet): the next visibility change retries.
      }
    };
    const onVisible = () => void acquire();

    void acquire();
    document.addEventListener('visibilitychange', onVisible);
    return () => {
      released = true;
      document.removeEventListener('visibilitychange', onVisible);
      void sentinel?.release().catch(() => undefined);
    };
  }, [active]);
}
