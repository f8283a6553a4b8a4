import { cva, type VariantProps } from 'class-variance-authority';
import type { ReactNode } from 'react';
import { label } from '@/lib/domain/vocabulary';
import { cn } from '@/lib/ui/cn';

export const badgeVariants = cva('inline-flex items-center rounded px-2 py-0.5 text-xs font-medium ring-1 ring-inset', {
  variants: {
    tone: {
      neutral: 'bg-slate-100 text-slate-700 ring-slate-300',
      brand: 'bg-brand-50 text-brand-800 ring-brand-100',
      near: 'bg-near-100 text-near-700 ring-near-500/40',
      missed: 'bg-missed-100 text-missed-700 ring-missed-600/30',
      safe: 'bg-safe-100 text-safe-700 ring-safe-600/30',
    },
  },
  defaultVariants: { tone: 'neutral' },
});

type Tone = NonNullable<VariantProps<typeof badgeVariants>['tone']>;

export function Badge({ tone, className, children }: { tone?: Tone; className?: string; children: ReactNode }) {
  return <span className={cn(badgeVariants({ tone }), className)}>{children}</span>;
}

const STATUS_TONES: Record<string, Tone> = {
  draft: 'neutral',
  scheduled: 'brand',
  in_progress: 'near',
  awaiting_review: 'near',
  sent_back: 'missed',
  approved: 'safe',
  reported: 'safe',
  closed: 'neutral',
  cancelled: 'neutral',
  issued: 'brand',
  paid: 'safe',
  void: 'neutral',
};

export function StatusBadge({ status }: { status: string }) {
  return <Badge tone={STATUS_TONES[status] ?? 'neutral'}>{label(status)}</Badge>;
}
