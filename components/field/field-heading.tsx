import Link from 'next/link';
import type { ReactNode } from 'react';
import { cn } from '@/lib/ui/cn';

/**
 * The top of a field screen: a back link big enough for a gloved thumb, the screen's one h1 in field type, and
 * what stands under it (the install's where-and-what line) as children.
 */
export function FieldHeading({
  title,
  back,
  children,
  className,
}: {
  title: ReactNode;
  back?: { href: string; label: ReactNode };
  children?: ReactNode;
  className?: string;
}) {
  return (
    <header className={className}>
      {back && (
        <Link href={back.href} className="text-base font-semibold text-brand-700 underline">
          {back.label}
        </Link>
      )}
      <h1 className={cn('text-3xl font-bold', back && 'mt-1')}>{title}</h1>
      {children}
    </header>
  );
}
