import type { ReactNode } from 'react';
import { cardClass } from '@/components/ui/card';
import { cn } from '@/lib/ui/cn';

/** What a list says when it has nothing to show, with an optional next step (a link or button). */
export function EmptyState({
  children,
  action,
  className,
}: {
  children: ReactNode;
  action?: ReactNode;
  className?: string;
}) {
  return (
    <div className={cn(cardClass, 'text-sm text-slate-600', className)}>
      <p>{children}</p>
      {action && <div className="mt-3">{action}</div>}
    </div>
  );
}
