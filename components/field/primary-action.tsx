'use client';

import type { ReactNode } from 'react';
import { buttonVariants } from '@/components/ui/button';
import { useHydrated } from '@/lib/client/use-hydrated';
import { cn } from '@/lib/ui/cn';

/**
 * The screen's one big action, full width and tall enough for a gloved thumb. Disabled until the page is running:
 * on the server's HTML alone a tap would do nothing, and the crew would believe it recorded.
 */
export function PrimaryAction({
  children,
  onClick,
  disabled,
  variant = 'primary',
}: {
  children: ReactNode;
  onClick: () => void;
  disabled?: boolean;
  variant?: 'primary' | 'danger' | 'secondary';
}) {
  const hydrated = useHydrated();
  return (
    <button
      type="button"
      onClick={onClick}
      disabled={disabled || !hydrated}
      className={cn(buttonVariants({ variant, size: 'field' }), 'min-h-[4rem] w-full text-2xl')}
    >
      {children}
    </button>
  );
}
