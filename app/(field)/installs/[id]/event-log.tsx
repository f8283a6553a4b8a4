'use client';

import { useTranslations } from 'next-intl';
import { memo } from 'react';
import { labelIn } from '@/i18n/labels';

type LoggedEvent = {
  clientEventId: string;
  type: string;
  deviceTime: string;
  synced: boolean;
  userName?: string | null;
};

/**
 * Every tap of this install, newest first, with where it is (this tablet or the server). Memoised: the install
 * screen re-renders every second for its clocks, the log only when a tap arrives.
 */
export const EventLog = memo(function EventLog({ events, timeZone }: { events: LoggedEvent[]; timeZone: string }) {
  const t = useTranslations('install.log');
  const tl = useTranslations('labels');
  const time = new Intl.DateTimeFormat('en-US', {
    timeZone,
    hour: '2-digit',
    minute: '2-digit',
    second: '2-digit',
    hour12: false,
  });
  return (
    <section className="rounded-xl bg-white p-4 ring-1 ring-slate-200">
      <h2 className="mb-2 text-xl font-bold">{t('title')}</h2>
      <ol className="divide-y divide-slate-100" data-testid="event-log">
        {[...events].reverse().map((event) => (
          <li key={event.clientEventId} className="flex items-center justify-between gap-3 py-2 text-base">
            <span className="font-mono tabular-nums">{time.format(new Date(event.deviceTime))}</span>
            <span className="flex-1">
              {labelIn(tl, event.type)}
              {event.userName ? ` · ${event.userName}` : ''}
            </span>
            <span className={event.synced ? 'text-safe-700' : 'text-near-700'}>
              {event.synced ? t('synced') : t('onTablet')}
            </span>
          </li>
        ))}
      </ol>
    </section>
  );
});
