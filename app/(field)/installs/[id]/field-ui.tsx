// Small field-mode building blocks shared by the install steps: big targets, high contrast.
import type { ReactNode } from 'react';
import { buttonClass } from '@/components/ui/button';

export function StepCard({ title, children, testId }: { title: string; children: ReactNode; testId?: string }) {
  return (
    <section className="space-y-4 rounded-xl bg-white p-5 shadow-sm ring-1 ring-slate-200" data-testid={testId}>
      <h2 className="text-2xl font-bold">{title}</h2>
      {children}
    </section>
  );
}

export function PrimaryAction({ children, onClick, disabled, variant = 'primary' }: { children: ReactNode; onClick: () => void; disabled?: boolean; variant?: 'primary' | 'danger' | 'secondary' }) {
  return (
    <button type="button" onClick={onClick} disabled={disabled} className={`${buttonClass(variant, 'field')} min-h-[4rem] w-full text-2xl`}>
      {children}
    </button>
  );
}

export function FieldInput({ id, label, hint, error, ...props }: React.InputHTMLAttributes<HTMLInputElement> & { id: string; label: string; hint?: string; error?: string }) {
  return (
    <div>
      <label htmlFor={id} className="block text-lg font-semibold">{label}</label>
      {hint && <p className="text-base text-slate-600">{hint}</p>}
      <input
        id={id}
        className="mt-1 block min-h-touch w-full rounded-md border-2 border-slate-400 px-3 text-xl"
        aria-invalid={!!error}
        aria-describedby={error ? `${id}-error` : undefined}
        {...props}
      />
      {error && <p id={`${id}-error`} className="mt-1 text-base font-medium text-missed-700">{error}</p>}
    </div>
  );
}

export function Callout({ tone, children }: { tone: 'near' | 'missed' | 'safe' | 'neutral'; children: ReactNode }) {
  const tones = {
    near: 'bg-near-100 text-near-700 ring-near-500',
    missed: 'bg-missed-100 text-missed-700 ring-missed-600',
    safe: 'bg-safe-100 text-safe-700 ring-safe-600',
    neutral: 'bg-slate-100 text-slate-800 ring-slate-300',
  } as const;
  return <div className={`rounded-lg p-4 text-lg ring-2 ${tones[tone]}`}>{children}</div>;
}
