'use client';

import type { OutboxEntry } from '@/lib/client/outbox';
import { OutboxNotices } from './outbox-notices';

/** Always visible: how many taps are only on this tablet, any waiting for another user, and any the server refused. */
export function SyncStatus({ queued, waiting = [], rejected }: { queued: OutboxEntry[]; waiting?: OutboxEntry[]; rejected: OutboxEntry[] }) {
  return (
    <div className="space-y-2" aria-live="polite">
      {queued.length > 0 ? (
        <p className="rounded-lg bg-near-100 px-4 py-2 text-lg font-semibold text-near-700" data-testid="sync-status">
          {queued.length} tap{queued.length === 1 ? '' : 's'} saved on this tablet — will sync when the signal is back
        </p>
      ) : (
        <p className="rounded-lg bg-safe-100 px-4 py-2 text-lg font-semibold text-safe-700" data-testid="sync-status">All taps synced</p>
      )}
      <OutboxNotices waiting={waiting} parked={rejected} />
    </div>
  );
}
