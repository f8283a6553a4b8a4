'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useTranslations } from 'next-intl';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { FormActions } from '@/components/desk/form-actions';
import { Field } from '@/components/desk/form-field';
import { useSaveRecord } from '@/components/desk/use-save-record';
import { LOCALES } from '@/i18n/locales';
import { CUSTOMER_KINDS, labelledOptions } from '@/lib/domain/vocabulary';
import { customerInputSchema } from '@/lib/validation/customers';
import { cardClass } from '@/components/ui/card';
import { cn } from '@/lib/ui/cn';

type Input = z.input<typeof customerInputSchema>;
type Output = z.output<typeof customerInputSchema>;

/** New or edit: the same zod schema as POST/PATCH /api/customers checks it here first, then the server again. */
export function CustomerForm({ customer }: { customer?: Input & { id: string } }) {
  const t = useTranslations('customers');
  const tc = useTranslations('common');
  const form = useForm<Input, unknown, Output>({
    resolver: zodResolver(customerInputSchema),
    defaultValues: customer ?? { name: '', kind: 'homeowner', language: 'en' },
  });
  const { message, save } = useSaveRecord(form.setError);
  const onSubmit = form.handleSubmit((values) =>
    save({ collection: '/api/customers', id: customer?.id, body: values, next: (id) => `/customers/${id}` }),
  );

  return (
    <form onSubmit={onSubmit} noValidate className={cn(cardClass, 'grid max-w-2xl gap-4 md:grid-cols-2')}>
      <Field form={form} name="name" label="Name" autoFocus />
      <Field form={form} name="kind" label="Kind" choices={labelledOptions(CUSTOMER_KINDS)} />
      <Field form={form} name="contactName" label="Contact person" />
      <Field form={form} name="email" label="E-mail (repair reports go here)" type="email" />
      <Field form={form} name="language" label={t('language')} as="select">
        {LOCALES.map((code) => (
          <option key={code} value={code}>
            {t(`languages.${code}`)}
          </option>
        ))}
      </Field>
      <Field form={form} name="phone" label="Phone" type="tel" />
      <Field form={form} name="billingAddress" label="Billing address" as="textarea" />
      <Field form={form} name="notes" label="Notes" as="textarea" className="md:col-span-2" />
      <FormActions
        message={message}
        form={form}
        submitLabel={customer ? tc('saveChanges') : 'Create customer'}
        pendingLabel={null}
        cancel
        cancelLabel={tc('cancel')}
      />
    </form>
  );
}
