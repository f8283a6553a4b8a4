'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import { useCloseEditSection } from '@/components/desk/edit-section';
import { FormField, errorProps } from '@/components/desk/form-field';
import { Input as TextInput, Select, Textarea } from '@/components/ui/input';
import { Button } from '@/components/ui/button';
import { applyServerErrors, submitJson } from '@/lib/client/submit-json';
import type { JobFormOptions } from '@/lib/data/jobs';
import { jobInputSchema } from '@/lib/validation/jobs';
import { cardClass } from '@/components/ui/card';
import { cn } from '@/lib/ui/cn';

type Input = z.input<typeof jobInputSchema>;
type Output = z.output<typeof jobInputSchema>;
type Editing = {
  id: string;
  customerId: string;
  siteId: string;
  title: string | null;
  notes: string | null;
  crewId: string | null;
  scheduledDate: string | null;
  siteLocked: boolean;
  scheduleLocked: boolean;
};

/** New or edit: the same zod schema as POST /api/jobs checks it here first; an edit sends only what may still change. */
export function JobForm({ options, job }: { options: JobFormOptions; job?: Editing }) {
  const router = useRouter();
  const closeEdit = useCloseEditSection();
  const [message, setMessage] = useState<string>();
  const {
    register,
    handleSubmit,
    setError,
    control,
    setValue,
    formState: { errors, isSubmitting },
  } = useForm<Input, unknown, Output>({
    // Locked fields are disabled controls, which a form may submit without a value: an edit does not require them.
    resolver: zodResolver(job ? (jobInputSchema.partial() as unknown as typeof jobInputSchema) : jobInputSchema),
    defaultValues: job
      ? {
          customerId: job.customerId,
          siteId: job.siteId,
          title: job.title ?? '',
          notes: job.notes ?? '',
          crewId: job.crewId ?? '',
          scheduledDate: job.scheduledDate ?? '',
        }
      : { customerId: '', siteId: '', title: '', notes: '', crewId: '', scheduledDate: '' },
  });
  const customerId = useWatch({ control, name: 'customerId' });
  const sites = options.customers.find((customer) => customer.id === customerId)?.sites ?? [];

  const onSubmit = handleSubmit(async (values) => {
    let result;
    if (job) {
      const { customerId: customer, siteId, crewId, scheduledDate, ...rest } = values;
      const body = {
        ...rest,
        ...(job.siteLocked ? {} : { customerId: customer, siteId }),
        ...(job.scheduleLocked ? {} : { crewId, scheduledDate }),
      };
      result = await submitJson<{ id: string }>(`/api/jobs/${job.id}`, 'PATCH', body);
    } else {
      result = await submitJson<{ id: string }>('/api/jobs', 'POST', values);
    }
    if (!result.ok) return setMessage(applyServerErrors(result.error, setError));
    closeEdit?.();
    router.push(`/jobs/${result.data.id}`);
    router.refresh();
  });

  const customerField = register('customerId', { onChange: () => setValue('siteId', '') });
  return (
    <form onSubmit={onSubmit} noValidate className={cn(cardClass, 'grid max-w-2xl gap-4 md:grid-cols-2')}>
      <FormField
        id="customerId"
        label="Customer"
        error={errors.customerId?.message}
        hint={job?.siteLocked ? 'Only a draft job can move to another customer.' : undefined}
      >
        <Select
          {...customerField}
          {...errorProps('customerId', errors.customerId?.message)}
          disabled={job?.siteLocked}
          autoFocus={!job}
        >
          <option value="">Pick a customer…</option>
          {options.customers.map((customer) => (
            <option key={customer.id} value={customer.id}>
              {customer.name}
            </option>
          ))}
        </Select>
      </FormField>
      <FormField
        id="siteId"
        label="Site"
        error={errors.siteId?.message}
        hint={
          customerId && sites.length === 0
            ? 'This customer has no site yet: add one on the customer’s page.'
            : undefined
        }
      >
        <Select
          {...register('siteId')}
          {...errorProps('siteId', errors.siteId?.message)}
          disabled={job?.siteLocked || !customerId}
        >
          <option value="">{customerId ? 'Pick a site…' : 'Pick the customer first'}</option>
          {sites.map((site) => (
            <option key={site.id} value={site.id}>
              {site.name} · {site.addressLine}, {site.city}
            </option>
          ))}
        </Select>
      </FormField>
      <div className="md:col-span-2">
        <FormField id="title" label="Title" error={errors.title?.message}>
          <TextInput
            {...register('title')}
            {...errorProps('title', errors.title?.message)}
            placeholder="e.g. Two fractures in the rear lateral"
          />
        </FormField>
      </div>
      <FormField
        id="crewId"
        label="Crew"
        error={errors.crewId?.message}
        hint={job?.scheduleLocked ? 'The crew and day can no longer change.' : 'A crew and a day schedule the job.'}
      >
        <Select
          {...register('crewId')}
          {...errorProps('crewId', errors.crewId?.message)}
          disabled={job?.scheduleLocked}
        >
          <option value="">None yet</option>
          {options.crews.map((crew) => (
            <option key={crew.id} value={crew.id}>
              {crew.name}
            </option>
          ))}
        </Select>
      </FormField>
      <FormField id="scheduledDate" label="Scheduled date" error={errors.scheduledDate?.message}>
        <TextInput
          type="date"
          {...register('scheduledDate')}
          {...errorProps('scheduledDate', errors.scheduledDate?.message)}
          disabled={job?.scheduleLocked}
        />
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
          {isSubmitting ? 'Saving…' : job ? 'Save changes' : 'Create job'}
        </Button>
        <Button type="button" variant="secondary" onClick={() => (closeEdit ? closeEdit() : router.back())}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
