import type { ButtonHTMLAttributes } from 'react';

type Variant = 'primary' | 'secondary' | 'danger' | 'ghost';
type Size = 'desk' | 'field';

const VARIANTS: Record<Variant, string> = {
  primary: 'bg-brand-700 text-white hover:bg-brand-800 disabled:bg-slate-400',
  secondary: 'bg-white text-slate-900 ring-1 ring-inset ring-slate-300 hover:bg-slate-100',
  danger: 'bg-missed-600 text-white hover:bg-missed-700',
  ghost: 'text-slate-700 hover:bg-slate-100',
};

// Field buttons are big enough for a gloved thumb (48 px+); desk buttons stay compact.
const SIZES: Record<Size, string> = {
  desk: 'h-9 px-3 text-sm',
  field: 'min-h-touch px-6 text-lg',
};

export function buttonClass(variant: Variant = 'primary', size: Size = 'desk') {
  return `inline-flex items-center justify-center gap-2 rounded-md font-semibold transition-colors disabled:cursor-not-allowed ${VARIANTS[variant]} ${SIZES[size]}`;
}

export function Button({
  variant = 'primary',
  size = 'desk',
  className = '',
  ...props
}: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant; size?: Size }) {
  return <button className={`${buttonClass(variant, size)} ${className}`} {...props} />;
}
