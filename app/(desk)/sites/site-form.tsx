'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { FormActions } from '@/components/desk/form-actions';
import { Field } from '@/components/desk/form-field';
import { namedOptions } from '@/lib/domain/vocabulary';
import { useSaveRecord } from '@/components/desk/use-save-record';
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
  const form = useForm<Input, unknown, Output>({
    resolver: zodResolver(siteInputSchema),
    defaultValues: site ?? { customerId: customerId ?? '', name: '', addressLine: '', city: '' },
  });
  const { message, save } = useSaveRecord(form.setError);
  // The customer is fixed once the site exists (undefined drops out of the JSON).
  const onSubmit = form.handleSubmit((values) =>
    save({
      collection: '/api/sites',
      id: site?.id,
      body: site ? { ...values, customerId: undefined } : values,
      next: (id) => `/sites/${id}`,
    }),
  );

  return (
    <form onSubmit={onSubmit} noValidate className={cn(cardClass, 'grid max-w-2xl gap-4 md:grid-cols-2')}>
      {!site && (
        <Field
          form={form}
          name="customerId"
          label="Customer"
          className="md:col-span-2"
          choices={namedOptions(customers ?? [])}
        >
          <option value="">Pick a customer…</option>
        </Field>
      )}
      <Field
        form={form}
        name="name"
        label="Site name"
        hint="What the crew calls it, e.g. “Rear yard” or “Block C”"
        autoFocus
      />
      <Field form={form} name="addressLine" label="Street address" autoComplete="street-address" />
      <Field form={form} name="city" label="City" />
      <Field form={form} name="region" label="Region" />
      <Field form={form} name="postalCode" label="Postal code" />
      <Field
        form={form}
        name="notes"
        label="Notes"
        as="textarea"
        hint="Access, parking, gate codes, traffic control the crew should know about"
        className="md:col-span-2"
      />
      <FormActions message={message} form={form} submitLabel={site ? 'Save changes' : 'Create site'} cancel />
    </form>
  );
}
