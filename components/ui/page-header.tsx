import Link from 'next/link';
import type { ReactNode } from 'react';
import { cn } from '@/lib/ui/cn';

/** Where the page's back link goes and what it says ("← Customers"). */
export type BackLink = { href: string; label: ReactNode };

/**
 * The top of a desk page: back link, the page's one h1 (with a badge beside it), a line under it, and the
 * page's actions on the right.
 */
export function PageHeader({
  title,
  back,
  badge,
  description,
  actions,
  className,
}: {
  title: ReactNode;
  back?: BackLink;
  badge?: ReactNode;
  description?: ReactNode;
  actions?: ReactNode;
  className?: string;
}) {
  return (
    <div className={cn('flex flex-wrap items-start justify-between gap-3', className)}>
      <div>
        {back && <BackLinkTo {...back} />}
        <h1 className={cn('text-2xl font-bold', back && 'mt-1', badge && 'flex items-center gap-3')}>
          {title}
          {badge}
        </h1>
        {description && <div className="text-sm text-slate-600">{description}</div>}
      </div>
      {actions && <div className="flex flex-wrap gap-2">{actions}</div>}
    </div>
  );
}

export function BackLinkTo({ href, label }: BackLink) {
  return (
    <Link href={href} className="text-sm text-brand-700 hover:underline">
      ← {label}
    </Link>
  );
}
