import { cva } from 'class-variance-authority';
import type { ReactNode } from 'react';

const calloutVariants = cva('rounded-lg p-4 text-lg ring-2', {
  variants: {
    tone: {
      near: 'bg-near-100 text-near-700 ring-near-500',
      missed: 'bg-missed-100 text-missed-700 ring-missed-600',
      safe: 'bg-safe-100 text-safe-700 ring-safe-600',
      neutral: 'bg-slate-100 text-slate-800 ring-slate-300',
    },
  },
});

/** A boxed message on a field screen in the semantic colours: amber near, red missed / unsafe, green safe. */
export function Callout({ tone, children }: { tone: 'near' | 'missed' | 'safe' | 'neutral'; children: ReactNode }) {
  return <div className={calloutVariants({ tone })}>{children}</div>;
}
