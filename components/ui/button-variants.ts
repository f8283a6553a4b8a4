import { cva, type VariantProps } from 'class-variance-authority';

// Apart from button.tsx so that a page can style a plain <button> without cn() and the class merger it brings
// (the sign-in page: the lightest of all).
/** The one button look, for `<button>`s and for links styled as buttons (`className={buttonVariants(...)}`). */
export const buttonVariants = cva(
  'inline-flex items-center justify-center gap-2 rounded-md font-semibold transition-colors disabled:cursor-not-allowed',
  {
    variants: {
      variant: {
        primary: 'bg-brand-700 text-white hover:bg-brand-800 disabled:bg-slate-400',
        secondary: 'bg-white text-slate-900 ring-1 ring-inset ring-slate-300 hover:bg-slate-100',
        danger: 'bg-missed-600 text-white hover:bg-missed-700',
        ghost: 'text-slate-700 hover:bg-slate-100',
      },
      // Field buttons are big enough for a gloved thumb (48 px+); desk buttons stay compact.
      size: {
        desk: 'h-9 px-3 text-sm',
        field: 'min-h-touch px-6 text-lg',
      },
    },
    defaultVariants: { variant: 'primary', size: 'desk' },
  },
);

export type ButtonVariantProps = VariantProps<typeof buttonVariants>;
