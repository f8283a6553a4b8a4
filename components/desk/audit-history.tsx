import { listAudit } from '@/lib/data/audit';
import { formatInZone } from '@/lib/time/dates';
import type { SessionUser } from '@/lib/auth/session';
import { cardClass } from '@/components/ui/card';

/** "History" panel of a detail page: who changed what, when and why (from the audit trail). */
export async function AuditHistory({
  user,
  entityType,
  entityId,
  timeZone,
}: {
  user: SessionUser;
  entityType: string;
  entityId: string;
  timeZone: string;
}) {
  const entries = await listAudit(user, entityType, entityId);
  return (
    <section aria-labelledby="history-heading" className={cardClass}>
      <h2 id="history-heading" className="mb-2 text-sm font-semibold uppercase tracking-wide text-slate-600">
        History
      </h2>
      {entries.length === 0 ? (
        <p className="text-sm text-slate-500">No changes recorded yet.</p>
      ) : (
        <ol className="space-y-2 text-sm">
          {entries.map((entry) => (
            <li key={entry.id} className="border-l-2 border-slate-200 pl-3">
              <p>
                <span className="font-medium">{entry.user?.name ?? 'System'}</span> · {entry.action} ·{' '}
                <time dateTime={new Date(entry.createdAt).toISOString()} className="text-slate-500">
                  {formatInZone(entry.createdAt, timeZone)}
                </time>
              </p>
              {Object.keys(entry.changes ?? {}).length > 0 && entry.action === 'update' && (
                <p className="text-xs text-slate-600">
                  {Object.entries(entry.changes as Record<string, { from: unknown; to: unknown }>)
                    .map(([field, change]) => `${field}: ${show(change?.from)} → ${show(change?.to)}`)
                    .join('; ')}
                </p>
              )}
              {entry.reason && <p className="text-xs text-slate-600">Why: {entry.reason}</p>}
            </li>
          ))}
        </ol>
      )}
    </section>
  );
}

const show = (value: unknown) => (value === null || value === undefined || value === '' ? '—' : String(value));
