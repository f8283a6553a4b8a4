import type { ComponentProps } from 'react';
import { cn } from '@/lib/ui/cn';

/** A white panel on the page's slate background; `cn(cardClass, ...)` gives a form, list or section the same look. */
export const cardClass = 'rounded-lg bg-white p-4 ring-1 ring-slate-200';

export function Card({ className, ...props }: ComponentProps<'div'>) {
  return <div className={cn(cardClass, className)} {...props} />;
}
