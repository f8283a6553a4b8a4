import { PlainTable } from '@/components/ui/plain-table';
import { formatInZone } from '@/lib/time/dates';
import { label, type InstallEventType } from '@/lib/domain/vocabulary';
import { correctionDetails, eventDetails } from '@/lib/review/event-text';
import type { UnitSystem } from '@/lib/units';

type LoggedEvent = {
  id: string;
  type: InstallEventType;
  deviceTime: Date | string;
  receivedAt: Date | string | null;
  userName: string | null;
  payload: Record<string, unknown>;
  corrects: { id: string; type: InstallEventType; deviceTime: Date | string; payload: Record<string, unknown> } | null;
};

/** Every event as stored: tapped (device clock) and heard (server clock) in the company's zone, who tapped, what it recorded. */
export function EventTimeline({
  log,
  timeZone,
  unitSystem,
  kits,
  packers,
}: {
  log: LoggedEvent[];
  timeZone: string;
  unitSystem: UnitSystem;
  kits: Record<string, string>;
  packers: Record<string, string>;
}) {
  const time = (at: Date | string) => formatInZone(at, timeZone, 'MMM d HH:mm:ss');
  const ctx = { unitSystem, kitName: (id: string) => kits[id], packerName: (id: string) => packers[id], time };
  return (
    <section aria-labelledby="events-heading" className="overflow-hidden rounded-lg bg-white ring-1 ring-slate-200">
      <h2 id="events-heading" className="px-4 pt-4 text-lg font-semibold">
        What the crew recorded
      </h2>
      <p className="px-4 pb-2 text-xs text-slate-500">
        Times in {timeZone}. “Tapped” is the tablet’s clock, “received” the server’s.
      </p>
      <PlainTable
        className="min-w-full text-sm"
        data-testid="event-timeline"
        headers={['Event', 'Tapped', 'Received', 'By', 'Recorded']}
      >
        {log.map((event) => {
          const isCorrection = event.type === 'correction';
          const details = isCorrection
            ? correctionDetails(event.payload, event.corrects, ctx)
            : eventDetails(event.type, event.payload, ctx);
          return (
            <tr key={event.id} data-type={event.type} className={isCorrection ? 'bg-near-100/50' : undefined}>
              <td className="px-3 py-2 font-medium">
                {label(event.type)}
                {isCorrection && event.corrects && (
                  <span className="block text-xs font-normal text-slate-600">
                    of “{label(event.corrects.type)}” tapped {time(event.corrects.deviceTime)}
                  </span>
                )}
              </td>
              <td className="px-3 py-2 font-mono tabular-nums">{time(event.deviceTime)}</td>
              <td className="px-3 py-2 font-mono tabular-nums">{event.receivedAt ? time(event.receivedAt) : '—'}</td>
              <td className="px-3 py-2">{event.userName ?? '—'}</td>
              <td className="px-3 py-2">{details.join(' · ') || '—'}</td>
            </tr>
          );
        })}
      </PlainTable>
    </section>
  );
}
