'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { useCloseEditSection } from '@/components/desk/edit-section';
import { FormField, errorProps } from '@/components/desk/form-field';
import { Input as TextInput, Select, Textarea } from '@/components/ui/input';
import { Button } from '@/components/ui/button';
import { applyServerErrors, submitJson } from '@/lib/client/submit-json';
import { siteInputSchema } from '@/lib/validation/sites';
import { cardClass } from '@/components/ui/card';
import { cn } from '@/lib/ui/cn';

type Input = z.input<typeof siteInputSchema>;
type Output = z.output<typeof siteInputSchema>;

/**
 * New or edit: the same zod schema as POST /api/sites checks it here first, then the server again.
 * A new site picks its customer; an existing one keeps it (PATCH does not take customerId).
 */
export function SiteForm({
  site,
  customers,
  customerId,
}: {
  site?: Input & { id: string };
  customers?: { id: string; name: string }[];
  customerId?: string;
}) {
  const router = useRouter();
  const closeEdit = useCloseEditSection();
  const [message, setMessage] = useState<string>();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<Input, unknown, Output>({
    resolver: zodResolver(siteInputSchema),
    defaultValues: site ?? { customerId: customerId ?? '', name: '', addressLine: '', city: '' },
  });

  const onSubmit = handleSubmit(async (values) => {
    // The customer is fixed once the site exists (undefined drops out of the JSON).
    const result = site
      ? await submitJson<{ id: string }>(`/api/sites/${site.id}`, 'PATCH', { ...values, customerId: undefined })
      : await submitJson<{ id: string }>('/api/sites', 'POST', values);
    if (!result.ok) return setMessage(applyServerErrors(result.error, setError));
    closeEdit?.();
    router.push(`/sites/${result.data.id}`);
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className={cn(cardClass, 'grid max-w-2xl gap-4 md:grid-cols-2')}>
      {!site && (
        <div className="md:col-span-2">
          <FormField id="customerId" label="Customer" error={errors.customerId?.message}>
            <Select {...register('customerId')} {...errorProps('customerId', errors.customerId?.message)}>
              <option value="">Pick a customer…</option>
              {(customers ?? []).map((customer) => (
                <option key={customer.id} value={customer.id}>
                  {customer.name}
                </option>
              ))}
            </Select>
          </FormField>
        </div>
      )}
      <FormField
        id="name"
        label="Site name"
        error={errors.name?.message}
        hint="What the crew calls it, e.g. “Rear yard” or “Block C”"
      >
        <TextInput {...register('name')} {...errorProps('name', errors.name?.message)} autoFocus />
      </FormField>
      <FormField id="addressLine" label="Street address" error={errors.addressLine?.message}>
        <TextInput
          {...register('addressLine')}
          {...errorProps('addressLine', errors.addressLine?.message)}
          autoComplete="street-address"
        />
      </FormField>
      <FormField id="city" label="City" error={errors.city?.message}>
        <TextInput {...register('city')} {...errorProps('city', errors.city?.message)} />
      </FormField>
      <FormField id="region" label="Region" error={errors.region?.message}>
        <TextInput {...register('region')} {...errorProps('region', errors.region?.message)} />
      </FormField>
      <FormField id="postalCode" label="Postal code" error={errors.postalCode?.message}>
        <TextInput {...register('postalCode')} {...errorProps('postalCode', errors.postalCode?.message)} />
      </FormField>
      <div className="md:col-span-2">
        <FormField
          id="notes"
          label="Notes"
          error={errors.notes?.message}
          hint="Access, parking, gate codes, traffic control the crew should know about"
        >
          <Textarea {...register('notes')} {...errorProps('notes', errors.notes?.message)} />
        </FormField>
      </div>
      {message && (
        <p role="alert" className="text-sm font-medium text-missed-700 md:col-span-2">
          {message}
        </p>
      )}
      <div className="flex gap-2 md:col-span-2">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? 'Saving…' : site ? 'Save changes' : 'Create site'}
        </Button>
        <Button type="button" variant="secondary" onClick={() => (closeEdit ? closeEdit() : router.back())}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
