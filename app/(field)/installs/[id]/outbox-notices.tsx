'use client';

import { useTranslations } from 'next-intl';
import type { OutboxEntry } from '@/lib/client/outbox';

/**
 * Taps on this tablet that are not on their way: those the server refused for good ("needs
 * attention", with its reason; kept on the tablet, never sent again) and those of another user,
 * which wait for that user to sign in here again.
 */
export function OutboxNotices({ waiting, parked }: { waiting: OutboxEntry[]; parked: OutboxEntry[] }) {
  const t = useTranslations('sync');
  const byUser = new Map<string, { name: string; count: number }>();
  for (const entry of waiting) {
    const key = entry.userId ?? '';
    const seen = byUser.get(key) ?? { name: entry.userName || t('anotherUser'), count: 0 };
    byUser.set(key, { ...seen, count: seen.count + 1 });
  }
  return (
    <>
      {[...byUser].map(([key, { name, count }]) => (
        <p
          key={key}
          className="rounded-lg bg-slate-100 px-4 py-2 text-lg font-semibold text-slate-800"
          data-testid="outbox-waiting"
        >
          {t('waiting', { count, name })}
        </p>
      ))}
      {parked.length > 0 && (
        <section
          className="rounded-lg border-2 border-missed-700 bg-missed-100 px-4 py-3 text-missed-700"
          data-testid="outbox-parked"
          aria-label={t('needsAttention')}
        >
          <h2 className="text-lg font-bold">{t('parkedTitle')}</h2>
          <p className="text-base">{t('parkedText')}</p>
          <ul className="mt-2 space-y-1">
            {parked.map((entry) => (
              <li key={entry.clientEventId} className="text-base" data-testid="outbox-parked-entry">
                <span className="font-semibold">{entry.type.replace(/_/g, ' ')}</span>: {entry.lastError}
              </li>
            ))}
          </ul>
        </section>
      )}
    </>
  );
}
