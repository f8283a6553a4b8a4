'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useTranslations } from 'next-intl';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { useCloseEditSection } from '@/components/desk/edit-section';
import { FormField, errorProps } from '@/components/desk/form-field';
import { Input as TextInput, Select, Textarea } from '@/components/ui/input';
import { Button } from '@/components/ui/button';
import { applyServerErrors, submitJson } from '@/lib/client/submit-json';
import { LOCALES } from '@/i18n/locales';
import { CUSTOMER_KINDS, label } from '@/lib/domain/vocabulary';
import { customerInputSchema } from '@/lib/validation/customers';
import { cardClass } from '@/components/ui/card';
import { cn } from '@/lib/ui/cn';

type Input = z.input<typeof customerInputSchema>;
type Output = z.output<typeof customerInputSchema>;

/** New or edit: the same zod schema as POST/PATCH /api/customers checks it here first, then the server again. */
export function CustomerForm({ customer }: { customer?: Input & { id: string } }) {
  const t = useTranslations('customers');
  const tc = useTranslations('common');
  const router = useRouter();
  const closeEdit = useCloseEditSection();
  const [message, setMessage] = useState<string>();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<Input, unknown, Output>({
    resolver: zodResolver(customerInputSchema),
    defaultValues: customer ?? { name: '', kind: 'homeowner', language: 'en' },
  });

  const onSubmit = handleSubmit(async (values) => {
    const result = customer
      ? await submitJson<{ id: string }>(`/api/customers/${customer.id}`, 'PATCH', values)
      : await submitJson<{ id: string }>('/api/customers', 'POST', values);
    if (!result.ok) return setMessage(applyServerErrors(result.error, setError));
    closeEdit?.();
    router.push(`/customers/${result.data.id}`);
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className={cn(cardClass, 'grid max-w-2xl gap-4 md:grid-cols-2')}>
      <FormField id="name" label="Name" error={errors.name?.message}>
        <TextInput {...register('name')} {...errorProps('name', errors.name?.message)} autoFocus />
      </FormField>
      <FormField id="kind" label="Kind" error={errors.kind?.message}>
        <Select {...register('kind')} {...errorProps('kind', errors.kind?.message)}>
          {CUSTOMER_KINDS.map((kind) => (
            <option key={kind} value={kind}>
              {label(kind)}
            </option>
          ))}
        </Select>
      </FormField>
      <FormField id="contactName" label="Contact person" error={errors.contactName?.message}>
        <TextInput {...register('contactName')} {...errorProps('contactName', errors.contactName?.message)} />
      </FormField>
      <FormField id="email" label="E-mail (repair reports go here)" error={errors.email?.message}>
        <TextInput type="email" {...register('email')} {...errorProps('email', errors.email?.message)} />
      </FormField>
      <FormField id="language" label={t('language')} error={errors.language?.message}>
        <Select {...register('language')} {...errorProps('language', errors.language?.message)}>
          {LOCALES.map((code) => (
            <option key={code} value={code}>
              {t(`languages.${code}`)}
            </option>
          ))}
        </Select>
      </FormField>
      <FormField id="phone" label="Phone" error={errors.phone?.message}>
        <TextInput type="tel" {...register('phone')} {...errorProps('phone', errors.phone?.message)} />
      </FormField>
      <FormField id="billingAddress" label="Billing address" error={errors.billingAddress?.message}>
        <Textarea {...register('billingAddress')} {...errorProps('billingAddress', errors.billingAddress?.message)} />
      </FormField>
      <div className="md:col-span-2">
        <FormField id="notes" label="Notes" error={errors.notes?.message}>
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
          {customer ? tc('saveChanges') : 'Create customer'}
        </Button>
        <Button type="button" variant="secondary" onClick={() => (closeEdit ? closeEdit() : router.back())}>
          {tc('cancel')}
        </Button>
      </div>
    </form>
  );
}
