// The outbox (Dexie and the event schemas it checks taps with) is loaded once, after the first
// paint: drawing an install's step needs neither, and together they weigh more than the screen.
// Its chunk is precached by the service worker, so it loads without signal too.

type OutboxModule = typeof import('./outbox');

let loading: Promise<OutboxModule> | null = null;

export function loadOutbox(): Promise<OutboxModule> {
  loading ??= import('./outbox').catch((error: unknown) => {
    loading = null;
    throw error;
  });
  return loading;
}
