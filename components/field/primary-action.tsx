import type { ReactNode } from 'react';
import { buttonVariants } from '@/components/ui/button';
import { cn } from '@/lib/ui/cn';

/** The screen's one big action, full width and tall enough for a gloved thumb. */
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
  return (
    <button
      type="button"
      onClick={onClick}
      disabled={disabled}
      className={cn(buttonVariants({ variant, size: 'field' }), 'min-h-[4rem] w-full text-2xl')}
    >
      {children}
    </button>
  );
}
