import { Badge } from '@/components/ui/badge';
import type { QualityFlag } from '@/lib/cure';
import { FLAG_LABELS } from '@/lib/review/flags';
import { cn } from '@/lib/ui/cn';

/** One badge per quality flag: red for critical, amber for a warning; the words say it too. */
export function FlagBadges({ flags }: { flags: Pick<QualityFlag, 'kind' | 'severity' | 'message'>[] }) {
  if (flags.length === 0) return <Badge tone="safe">No flags</Badge>;
  return (
    <span className="flex flex-wrap gap-1">
      {flags.map((flag) => (
        <span key={flag.kind} data-kind={flag.kind} data-severity={flag.severity} title={flag.message}>
          <Badge tone={flag.severity === 'critical' ? 'missed' : 'near'}>
            <span className="sr-only">{flag.severity === 'critical' ? 'Critical: ' : 'Warning: '}</span>
            {FLAG_LABELS[flag.kind] ?? flag.kind}
          </Badge>
        </span>
      ))}
    </span>
  );
}

/** The flags with their full sentences, as the review page lists them. */
export function FlagList({ flags }: { flags: Pick<QualityFlag, 'kind' | 'severity' | 'message'>[] }) {
  if (flags.length === 0)
    return (
      <p className="text-sm text-safe-700">
        No quality flags: the record kept to the resin’s clock and the packer’s rating.
      </p>
    );
  return (
    <ul className="space-y-2" data-testid="flag-list">
      {flags.map((flag) => (
        <li
          key={flag.kind}
          data-kind={flag.kind}
          className={cn(
            'rounded-md px-3 py-2 text-sm',
            flag.severity === 'critical' ? 'bg-missed-100 text-missed-700' : 'bg-near-100 text-near-700',
          )}
        >
          <span className="font-semibold">
            {flag.severity === 'critical' ? 'Critical' : 'Warning'} · {FLAG_LABELS[flag.kind] ?? flag.kind}:
          </span>{' '}
          {flag.message}
        </li>
      ))}
    </ul>
  );
}
