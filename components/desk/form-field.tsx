import type { ComponentProps, ReactNode } from 'react';
import {
  get,
  type FieldErrors,
  type FieldValues,
  type Path,
  type RegisterOptions,
  type UseFormRegister,
} from 'react-hook-form';
import { Input, Select, Textarea } from '@/components/ui/input';

/** A labelled desk form control with its error under it (linked by aria-describedby for screen readers). */
export function FormField({
  id,
  label,
  error,
  hint,
  children,
}: {
  id: string;
  label: string;
  error?: string;
  hint?: string;
  children: ReactNode;
}) {
  return (
    <div className="flex flex-col gap-1 text-sm">
      <label htmlFor={id} className="font-medium text-slate-800">
        {label}
      </label>
      {children}
      {hint && !error && (
        <p id={`${id}-hint`} className="text-xs text-slate-500">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} role="alert" className="text-xs font-medium text-missed-700">
          {error}
        </p>
      )}
    </div>
  );
}

/** The aria props tying a control (Input, Select, Textarea of components/ui/input) to its FormField error. */
export const errorProps = (id: string, error?: string) => ({
  id,
  'aria-invalid': error ? true : undefined,
  'aria-describedby': error ? `${id}-error` : undefined,
});

/** What a Field needs of its react-hook-form form (`useForm()`'s answer fits). */
export type FieldForm<F extends FieldValues> = {
  register: UseFormRegister<F>;
  formState: { errors: FieldErrors<F> };
};

type ControlProps = Pick<
  ComponentProps<'input'>,
  'type' | 'step' | 'min' | 'max' | 'inputMode' | 'autoFocus' | 'autoComplete' | 'disabled' | 'placeholder'
>;

/**
 * One field of a react-hook-form form: FormField (label, hint, error) around an Input, a Select (its `choices`,
 * after any options given as children) or a Textarea (`as="textarea"`) registered under `name`, which is also the
 * control's id. `decimal` makes a number input that takes decimals; `valueAsNumber` registers it as a number. `className` wraps the field in a
 * div of its own (a grid span such as `md:col-span-2`).
 */
export function Field<F extends FieldValues>({
  form,
  name,
  label,
  hint,
  as,
  decimal,
  valueAsNumber,
  registerOptions,
  choices,
  className,
  children,
  ...control
}: ControlProps & {
  form: FieldForm<F>;
  name: Path<F>;
  label: string;
  hint?: string;
  as?: 'input' | 'select' | 'textarea';
  decimal?: boolean;
  valueAsNumber?: boolean;
  registerOptions?: RegisterOptions<F, Path<F>>;
  choices?: { value: string | number; label: ReactNode }[];
  className?: string;
  children?: ReactNode;
}) {
  const error = (get(form.formState.errors, name) as { message?: string } | undefined)?.message;
  const props = {
    ...(decimal ? { type: 'number', step: 'any', inputMode: 'decimal' as const } : {}),
    ...control,
    ...form.register(
      name,
      (valueAsNumber ? { ...registerOptions, valueAsNumber: true } : registerOptions) as RegisterOptions<F, Path<F>>,
    ),
    ...errorProps(name, error),
  };
  const kind = as ?? (choices || children ? 'select' : 'input');
  const field = (
    <FormField id={name} label={label} error={error} hint={hint}>
      {kind === 'select' ? (
        <Select {...(props as ComponentProps<'select'>)}>
          {children}
          {choices?.map((choice) => (
            <option key={choice.value} value={choice.value}>
              {choice.label}
            </option>
          ))}
        </Select>
      ) : kind === 'textarea' ? (
        <Textarea {...(props as ComponentProps<'textarea'>)} />
      ) : (
        <Input {...props} />
      )}
    </FormField>
  );
  return className ? <div className={className}>{field}</div> : field;
}
