'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import { FormActions } from '@/components/desk/form-actions';
import { Field } from '@/components/desk/form-field';
import { namedOptions } from '@/lib/domain/vocabulary';
import { useSaveRecord } from '@/components/desk/use-save-record';
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
  const form = useForm<Input, unknown, Output>({
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
  const { message, save } = useSaveRecord(form.setError);
  const customerId = useWatch({ control: form.control, name: 'customerId' });
  const sites = options.customers.find((customer) => customer.id === customerId)?.sites ?? [];

  const onSubmit = form.handleSubmit((values) => {
    const { customerId: customer, siteId, crewId, scheduledDate, ...rest } = values;
    const edit = job && {
      ...rest,
      ...(job.siteLocked ? {} : { customerId: customer, siteId }),
      ...(job.scheduleLocked ? {} : { crewId, scheduledDate }),
    };
    return save({ collection: '/api/jobs', id: job?.id, body: edit || values, next: (id) => `/jobs/${id}` });
  });

  return (
    <form onSubmit={onSubmit} noValidate className={cn(cardClass, 'grid max-w-2xl gap-4 md:grid-cols-2')}>
      <Field
        form={form}
        name="customerId"
        label="Customer"
        registerOptions={{ onChange: () => form.setValue('siteId', '') }}
        hint={job?.siteLocked ? 'Only a draft job can move to another customer.' : undefined}
        disabled={job?.siteLocked}
        autoFocus={!job}
        choices={namedOptions(options.customers)}
      >
        <option value="">Pick a customer…</option>
      </Field>
      <Field
        form={form}
        name="siteId"
        label="Site"
        hint={
          customerId && sites.length === 0
            ? 'This customer has no site yet: add one on the customer’s page.'
            : undefined
        }
        disabled={job?.siteLocked || !customerId}
      >
        <option value="">{customerId ? 'Pick a site…' : 'Pick the customer first'}</option>
        {sites.map((site) => (
          <option key={site.id} value={site.id}>
            {site.name} · {site.addressLine}, {site.city}
          </option>
        ))}
      </Field>
      <Field
        form={form}
        name="title"
        label="Title"
        placeholder="e.g. Two fractures in the rear lateral"
        className="md:col-span-2"
      />
      <Field
        form={form}
        name="crewId"
        label="Crew"
        hint={job?.scheduleLocked ? 'The crew and day can no longer change.' : 'A crew and a day schedule the job.'}
        disabled={job?.scheduleLocked}
        choices={namedOptions(options.crews)}
      >
        <option value="">None yet</option>
      </Field>
      <Field form={form} name="scheduledDate" label="Scheduled date" type="date" disabled={job?.scheduleLocked} />
      <Field form={form} name="notes" label="Notes" as="textarea" className="md:col-span-2" />
      <FormActions message={message} form={form} submitLabel={job ? 'Save changes' : 'Create job'} cancel />
    </form>
  );
}
