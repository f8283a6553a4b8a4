'use client';

import type { OutboxEntry } from '@/lib/client/outbox';

/**
 * Taps on this tablet that are not on their way: those the server refused for good ("needs
 * attention", with its reason; kept on the tablet, never sent again) and those of another user,
 * which wait for that user to sign in here again.
 */
export function OutboxNotices({ waiting, parked }: { waiting: OutboxEntry[]; parked: OutboxEntry[] }) {
  const byUser = new Map<string, { name: string; count: number }>();
  for (const entry of waiting) {
    const key = entry.userId ?? '';
    const seen = byUser.get(key) ?? { name: entry.userName || 'another user', count: 0 };
    byUser.set(key, { ...seen, count: seen.count + 1 });
  }
  return (
    <>
      {[...byUser].map(([key, { name, count }]) => (
        <p key={key} className="rounded-lg bg-slate-100 px-4 py-2 text-lg font-semibold text-slate-800" data-testid="outbox-waiting">
          {count} tap{count === 1 ? '' : 's'} waiting for {name} to sign in
        </p>
      ))}
      {parked.length > 0 && (
        <section className="rounded-lg border-2 border-missed-700 bg-missed-100 px-4 py-3 text-missed-700" data-testid="outbox-parked" aria-label="Needs attention">
          <h2 className="text-lg font-bold">Needs attention — not recorded</h2>
          <p className="text-base">These taps stay on this tablet; tell the office or record them again if they still apply.</p>
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
