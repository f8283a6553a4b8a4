import type { ComponentProps } from 'react';
import { cn } from '@/lib/ui/cn';

// Desk form controls: compact, a red border when the control carries aria-invalid (errorProps in form-field).
const CONTROL = 'rounded-md border border-slate-300 aria-[invalid=true]:border-missed-600';

export function Input({ className, ...props }: ComponentProps<'input'>) {
  return <input className={cn(CONTROL, 'h-9 px-2', className)} {...props} />;
}

export function Select({ className, ...props }: ComponentProps<'select'>) {
  return <select className={cn(CONTROL, 'h-9 px-2', className)} {...props} />;
}

export function Textarea({ className, ...props }: ComponentProps<'textarea'>) {
  return <textarea className={cn(CONTROL, 'min-h-20 p-2', className)} {...props} />;
}
