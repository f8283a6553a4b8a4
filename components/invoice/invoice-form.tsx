'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useFieldArray, useForm } from 'react-hook-form';
import { FormField, errorProps } from '@/components/desk/form-field';
import { Input, Select } from '@/components/ui/input';
import { Button } from '@/components/ui/button';
import { applyServerErrors, submitJson } from '@/lib/client/submit-json';
import { CURRENCIES } from '@/lib/validation/invoices';
import { invoiceFormSchema, type InvoiceFormValues } from '@/lib/validation/invoice-form';
import type { InvoiceInput } from '@/lib/validation/invoices';

/** Drafts the job's invoice: one line per repair to start with; lines can be added and removed. */
export function InvoiceForm({ defaults }: { defaults: InvoiceFormValues }) {
  const router = useRouter();
  const [message, setMessage] = useState<string>();
  const {
    register,
    control,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<InvoiceFormValues, unknown, InvoiceInput>({
    resolver: zodResolver(invoiceFormSchema),
    defaultValues: defaults,
  });
  const { fields, append, remove } = useFieldArray({ control, name: 'lines' });

  const onSubmit = handleSubmit(async (values) => {
    const result = await submitJson('/api/invoices', 'POST', values);
    if (!result.ok) return setMessage(applyServerErrors(result.error, setError));
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label="New invoice" className="space-y-3">
      <table className="min-w-full text-sm">
        <thead className="text-left text-xs uppercase text-slate-600">
          <tr>
            <th className="py-1 pr-2">Description</th>
            <th className="w-24 py-1 pr-2">Quantity</th>
            <th className="w-36 py-1 pr-2">Unit price</th>
            <th className="w-16" />
          </tr>
        </thead>
        <tbody>
          {fields.map((field, index) => {
            // The API schema names the price unitPriceCents; the form shows its message under the price.
            const lineErrors = errors.lines?.[index] as (typeof errors.lines & object)[number] & {
              unitPriceCents?: { message?: string };
            };
            return (
              <tr key={field.id} className="align-top">
                <td className="py-1 pr-2">
                  <Input
                    aria-label={`Line ${index + 1} description`}
                    {...register(`lines.${index}.description`)}
                    {...errorProps(`line-${index}-description`, lineErrors?.description?.message)}
                    className="w-full"
                  />
                  {lineErrors?.description && (
                    <p className="text-xs text-missed-700">{lineErrors.description.message}</p>
                  )}
                </td>
                <td className="py-1 pr-2">
                  <Input
                    aria-label={`Line ${index + 1} quantity`}
                    inputMode="decimal"
                    {...register(`lines.${index}.quantity`)}
                    className="w-full"
                  />
                  {lineErrors?.quantity && <p className="text-xs text-missed-700">{lineErrors.quantity.message}</p>}
                </td>
                <td className="py-1 pr-2">
                  <Input
                    aria-label={`Line ${index + 1} unit price`}
                    inputMode="decimal"
                    {...register(`lines.${index}.unitPrice`)}
                    className="w-full"
                  />
                  {(lineErrors?.unitPrice || lineErrors?.unitPriceCents) && (
                    <p className="text-xs text-missed-700">
                      {(lineErrors.unitPrice ?? lineErrors.unitPriceCents)?.message}
                    </p>
                  )}
                </td>
                <td className="py-1">
                  <Button
                    type="button"
                    variant="ghost"
                    aria-label={`Remove line ${index + 1}`}
                    onClick={() => remove(index)}
                  >
                    ✕
                  </Button>
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      {errors.lines?.message && (
        <p role="alert" className="text-sm text-missed-700">
          {errors.lines.message}
        </p>
      )}
      <Button
        type="button"
        variant="secondary"
        onClick={() => append({ description: '', quantity: '1', unitPrice: '' })}
      >
        Add line
      </Button>
      <div className="grid gap-3 md:grid-cols-3">
        <FormField id="taxRatePct" label="Tax rate (%)" error={errors.taxRatePct?.message}>
          <Input
            inputMode="decimal"
            {...register('taxRatePct')}
            {...errorProps('taxRatePct', errors.taxRatePct?.message)}
          />
        </FormField>
        <FormField id="dueOn" label="Due date" error={errors.dueOn?.message}>
          <Input type="date" {...register('dueOn')} {...errorProps('dueOn', errors.dueOn?.message)} />
        </FormField>
        <FormField id="currency" label="Currency" error={errors.currency?.message}>
          <Select {...register('currency')} {...errorProps('currency', errors.currency?.message)}>
            {CURRENCIES.map((currency) => (
              <option key={currency} value={currency}>
                {currency.toUpperCase()}
              </option>
            ))}
          </Select>
        </FormField>
      </div>
      {message && (
        <p role="alert" className="text-sm font-medium text-missed-700">
          {message}
        </p>
      )}
      <Button type="submit" disabled={isSubmitting}>
        Create invoice
      </Button>
    </form>
  );
}
