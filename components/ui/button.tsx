import type { ButtonHTMLAttributes } from 'react';
import { cn } from '@/lib/ui/cn';
import { buttonVariants, type ButtonVariantProps } from './button-variants';

export { buttonVariants, type ButtonVariantProps };

export function Button({
  variant,
  size,
  className,
  ...props
}: ButtonHTMLAttributes<HTMLButtonElement> & ButtonVariantProps) {
  return <button className={cn(buttonVariants({ variant, size }), className)} {...props} />;
}
