'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useFieldArray, useForm } from 'react-hook-form';
import { FormActions } from '@/components/desk/form-actions';
import { Field, errorProps } from '@/components/desk/form-field';
import { Input } from '@/components/ui/input';
import { Button } from '@/components/ui/button';
import { applyServerErrors, submitJson } from '@/lib/client/submit-json';
import {
  checklistTemplateInputSchema,
  type ChecklistTemplateFormValues,
  type ChecklistTemplateInput,
} from '@/lib/validation/checklist-templates';
import { cardClass } from '@/components/ui/card';
import { cn } from '@/lib/ui/cn';

/**
 * The crew's pre-install checks, in their order. Items keep their ids (answers on past installs name them);
 * new items get one from the server. Save sends the whole ordered list.
 */
export function ChecklistForm({ id, initial }: { id?: string; initial?: ChecklistTemplateFormValues }) {
  const router = useRouter();
  const [message, setMessage] = useState<string>();
  const form = useForm<ChecklistTemplateFormValues, unknown, ChecklistTemplateInput>({
    resolver: zodResolver(checklistTemplateInputSchema),
    defaultValues: initial ?? { name: '', active: true, items: [{ label: '', required: true }] },
  });
  const {
    register,
    control,
    handleSubmit,
    setError,
    setFocus,
    formState: { errors },
  } = form;
  // keyName: our items have an `id` of their own.
  const { fields, append, remove, move } = useFieldArray({ control, name: 'items', keyName: 'key' });

  const onSubmit = handleSubmit(async (values) => {
    const result = id
      ? await submitJson<{ id: string }>(`/api/checklist-templates/${id}`, 'PATCH', values)
      : await submitJson<{ id: string }>('/api/checklist-templates', 'POST', values);
    if (!result.ok) return setMessage(applyServerErrors(result.error, setError));
    router.push(`/admin/checklists/${result.data.id}`);
    router.refresh();
  });
  const shift = (from: number, to: number) => {
    move(from, to);
    setMessage(`Item moved to position ${to + 1}.`);
  };

  return (
    <form onSubmit={onSubmit} noValidate className={cn(cardClass, 'max-w-3xl space-y-4')}>
      <div className="grid gap-4 md:grid-cols-3">
        <Field form={form} name="name" label="Name" autoFocus className="md:col-span-2" />
        <label className="flex items-center gap-2 self-end text-sm font-medium">
          <input type="checkbox" {...register('active')} className="h-4 w-4" /> Active (offered to new installs)
        </label>
      </div>
      <fieldset>
        <legend className="mb-2 text-sm font-semibold">Items, in the order the crew sees them</legend>
        {errors.items?.message && (
          <p role="alert" className="text-xs font-medium text-missed-700">
            {errors.items.message}
          </p>
        )}
        <ol className="space-y-2">
          {fields.map((field, index) => {
            const error = errors.items?.[index]?.label?.message ?? errors.items?.[index]?.id?.message;
            const name = `items.${index}.label` as const;
            return (
              <li key={field.key} className="flex flex-wrap items-start gap-2 rounded-md bg-slate-50 p-2">
                <span className="w-6 pt-2 text-right text-sm text-slate-500" aria-hidden="true">
                  {index + 1}.
                </span>
                <div className="min-w-64 flex-1">
                  <Input
                    aria-label={`Item ${index + 1}`}
                    {...register(name)}
                    {...errorProps(`item-${index}`, error)}
                    className="w-full"
                  />
                  {error && (
                    <p id={`item-${index}-error`} role="alert" className="text-xs font-medium text-missed-700">
                      {error}
                    </p>
                  )}
                </div>
                <label className="flex items-center gap-1 pt-2 text-sm">
                  <input
                    type="checkbox"
                    {...register(`items.${index}.required`)}
                    className="h-4 w-4"
                    aria-label={`Item ${index + 1} required`}
                  />{' '}
                  Required
                </label>
                <Button
                  type="button"
                  variant="ghost"
                  aria-label={`Move item ${index + 1} up`}
                  disabled={index === 0}
                  onClick={() => shift(index, index - 1)}
                >
                  ↑
                </Button>
                <Button
                  type="button"
                  variant="ghost"
                  aria-label={`Move item ${index + 1} down`}
                  disabled={index === fields.length - 1}
                  onClick={() => shift(index, index + 1)}
                >
                  ↓
                </Button>
                <Button
                  type="button"
                  variant="ghost"
                  aria-label={`Remove item ${index + 1}`}
                  onClick={() => remove(index)}
                >
                  Remove
                </Button>
              </li>
            );
          })}
        </ol>
        <Button
          type="button"
          variant="secondary"
          className="mt-2"
          onClick={() => {
            append({ label: '', required: true });
            setTimeout(() => setFocus(`items.${fields.length}.label`), 0);
          }}
        >
          Add item
        </Button>
      </fieldset>
      <p className="text-xs text-slate-600">
        Checks support, never replace, the confined-space, traffic and chemical procedures your local codes and licensed
        practice require.
      </p>
      <p role="status" aria-live="polite" className="text-sm text-slate-700">
        {message}
      </p>
      <FormActions form={form} className="" submitLabel={id ? 'Save check-list' : 'Create check-list'} cancel />
    </form>
  );
}
