'use client';

import type { OutboxEntry } from '@/lib/client/outbox';

/** Always visible: how many taps are only on this tablet, and any the server refused. */
export function SyncStatus({ queued, rejected }: { queued: OutboxEntry[]; rejected: OutboxEntry[] }) {
  return (
    <div className="space-y-2" aria-live="polite">
      {queued.length > 0 ? (
        <p className="rounded-lg bg-near-100 px-4 py-2 text-lg font-semibold text-near-700" data-testid="sync-status">
          {queued.length} tap{queued.length === 1 ? '' : 's'} saved on this tablet — will sync when the signal is back
        </p>
      ) : (
        <p className="rounded-lg bg-safe-100 px-4 py-2 text-lg font-semibold text-safe-700" data-testid="sync-status">All taps synced</p>
      )}
      {rejected.map((entry) => (
        <p key={entry.clientEventId} className="rounded-lg bg-missed-100 px-4 py-2 text-base text-missed-700">
          Not accepted ({entry.type.replace(/_/g, ' ')}): {entry.lastError}
        </p>
      ))}
    </div>
  );
}
