import type { InputHTMLAttributes } from 'react';

/** A field-mode input: large label and text, its hint and error tied to it for screen readers. */
export function FieldInput({
  id,
  label,
  hint,
  error,
  ...props
}: InputHTMLAttributes<HTMLInputElement> & {
  id: string;
  label: string;
  hint?: string;
  error?: string;
}) {
  return (
    <div>
      <label htmlFor={id} className="block text-lg font-semibold">
        {label}
      </label>
      {hint && <p className="text-base text-slate-600">{hint}</p>}
      <input
        id={id}
        className="mt-1 block min-h-touch w-full rounded-md border-2 border-slate-400 px-3 text-xl"
        aria-invalid={!!error}
        aria-describedby={error ? `${id}-error` : undefined}
        {...props}
      />
      {error && (
        <p id={`${id}-error`} className="mt-1 text-base font-medium text-missed-700">
          {error}
        </p>
      )}
    </div>
  );
}
