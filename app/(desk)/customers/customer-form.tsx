'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { FormField, errorProps, inputClass, textareaClass } from '@/components/desk/form-field';
import { Button } from '@/components/ui/button';
import { applyServerErrors, submitJson } from '@/lib/client/submit-json';
import { CUSTOMER_KINDS, label } from '@/lib/domain/vocabulary';
import { customerInputSchema } from '@/lib/validation/customers';

type Input = z.input<typeof customerInputSchema>;
type Output = z.output<typeof customerInputSchema>;

/** New or edit: the same zod schema as POST/PATCH /api/customers checks it here first, then the server again. */
export function CustomerForm({ customer }: { customer?: Input & { id: string } }) {
  const router = useRouter();
  const [message, setMessage] = useState<string>();
  const { register, handleSubmit, setError, formState: { errors, isSubmitting } } = useForm<Input, unknown, Output>({
    resolver: zodResolver(customerInputSchema),
    defaultValues: customer ?? { name: '', kind: 'homeowner' },
  });

  const onSubmit = handleSubmit(async (values) => {
    const result = customer
      ? await submitJson<{ id: string }>(`/api/customers/${customer.id}`, 'PATCH', values)
      : await submitJson<{ id: string }>('/api/customers', 'POST', values);
    if (!result.ok) return setMessage(applyServerErrors(result.error, setError));
    router.push(`/customers/${result.data.id}`);
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="grid max-w-2xl gap-4 rounded-lg bg-white p-4 ring-1 ring-slate-200 md:grid-cols-2">
      <FormField id="name" label="Name" error={errors.name?.message}>
        <input {...register('name')} {...errorProps('name', errors.name?.message)} className={inputClass} autoFocus />
      </FormField>
      <FormField id="kind" label="Kind" error={errors.kind?.message}>
        <select {...register('kind')} {...errorProps('kind', errors.kind?.message)} className={inputClass}>
          {CUSTOMER_KINDS.map((kind) => <option key={kind} value={kind}>{label(kind)}</option>)}
        </select>
      </FormField>
      <FormField id="contactName" label="Contact person" error={errors.contactName?.message}>
        <input {...register('contactName')} {...errorProps('contactName', errors.contactName?.message)} className={inputClass} />
      </FormField>
      <FormField id="email" label="E-mail (repair reports go here)" error={errors.email?.message}>
        <input type="email" {...register('email')} {...errorProps('email', errors.email?.message)} className={inputClass} />
      </FormField>
      <FormField id="phone" label="Phone" error={errors.phone?.message}>
        <input type="tel" {...register('phone')} {...errorProps('phone', errors.phone?.message)} className={inputClass} />
      </FormField>
      <FormField id="billingAddress" label="Billing address" error={errors.billingAddress?.message}>
        <textarea {...register('billingAddress')} {...errorProps('billingAddress', errors.billingAddress?.message)} className={textareaClass} />
      </FormField>
      <div className="md:col-span-2">
        <FormField id="notes" label="Notes" error={errors.notes?.message}>
          <textarea {...register('notes')} {...errorProps('notes', errors.notes?.message)} className={textareaClass} />
        </FormField>
      </div>
      {message && <p role="alert" className="text-sm font-medium text-missed-700 md:col-span-2">{message}</p>}
      <div className="flex gap-2 md:col-span-2">
        <Button type="submit" disabled={isSubmitting}>{customer ? 'Save changes' : 'Create customer'}</Button>
        <Button type="button" variant="secondary" onClick={() => router.back()}>Cancel</Button>
      </div>
    </form>
  );
}
