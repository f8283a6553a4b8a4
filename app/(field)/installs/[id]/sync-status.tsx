'use client';

import { useTranslations } from 'next-intl';
import type { OutboxEntry } from '@/lib/client/outbox';
import { OutboxNotices } from './outbox-notices';

/** Always visible: how many taps are only on this tablet, any waiting for another user, and any the server refused. */
export function SyncStatus({
  queued,
  waiting = [],
  rejected,
}: {
  queued: OutboxEntry[];
  waiting?: OutboxEntry[];
  rejected: OutboxEntry[];
}) {
  const t = useTranslations('sync');
  return (
    <div className="space-y-2" aria-live="polite">
      {queued.length > 0 ? (
        <p className="rounded-lg bg-near-100 px-4 py-2 text-lg font-semibold text-near-700" data-testid="sync-status">
          {t('queued', { count: queued.length })}
        </p>
      ) : (
        <p className="rounded-lg bg-safe-100 px-4 py-2 text-lg font-semibold text-safe-700" data-testid="sync-status">
          {t('allSynced')}
        </p>
      )}
      <OutboxNotices waiting={waiting} parked={rejected} />
    </div>
  );
}
