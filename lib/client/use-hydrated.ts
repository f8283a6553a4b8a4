'use client';

import { useSyncExternalStore } from 'react';

const neverChanges = () => () => undefined;

/**
 * False while the page is only the server's HTML, true once React runs it in the browser. A button drawn by the
 * server does nothing until then: a tap on it would be lost without a word.
 */
export function useHydrated(): boolean {
  return useSyncExternalStore(
    neverChanges,
    () => true,
    () => false,
  );
}
