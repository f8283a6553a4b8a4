import Link from 'next/link';
import { StatusBadge } from '@/components/ui/badge';
import { formatInZone } from '@/lib/time/dates';
import { cardClass } from '@/components/ui/card';

type Attempt = {
  id: string;
  status: string;
  inspectionResult: string | null;
  startedAt: Date | null;
  createdAt: Date;
  replacesInstallId: string | null;
};

/** The installs of a repair in order, each redo beside the attempt it replaces (all are kept). */
export function InstallAttempts({ attempts, timeZone }: { attempts: Attempt[]; timeZone: string }) {
  if (attempts.length === 0) return null;
  const number = new Map(attempts.map((a, i) => [a.id, i + 1]));
  return (
    <section aria-labelledby="attempts-heading" className={cardClass}>
      <h2 id="attempts-heading" className="mb-2 text-lg font-semibold">
        Installs
      </h2>
      <ol className="space-y-2 text-sm" data-testid="install-attempts">
        {attempts.map((a, i) => (
          <li key={a.id} className="flex flex-wrap items-center gap-2">
            <Link href={`/reviews/${a.id}`} className="font-medium text-brand-700 hover:underline">
              Attempt {i + 1}
            </Link>
            <StatusBadge status={a.status} />
            <span className="text-slate-600">
              started {a.startedAt ? formatInZone(a.startedAt, timeZone) : 'not yet'}
            </span>
            {a.inspectionResult === 'fail' && <span className="font-medium text-missed-700">inspection failed</span>}
            {a.replacesInstallId && (
              <span className="text-slate-600">· redo of attempt {number.get(a.replacesInstallId) ?? '?'}</span>
            )}
          </li>
        ))}
      </ol>
    </section>
  );
}
