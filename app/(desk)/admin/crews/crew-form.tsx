'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { FormActions, type FormMessage } from '@/components/desk/form-actions';
import { Field } from '@/components/desk/form-field';
import { applyServerErrors, submitJson } from '@/lib/client/submit-json';
import { crewInputSchema, type CrewInput } from '@/lib/validation/crews';
import { cn } from '@/lib/ui/cn';
import { cardClass } from '@/components/ui/card';

/** New or edit: the same schema as POST /api/crews (PATCH takes the same fields). */
export function CrewForm({ crew }: { crew?: CrewInput & { id: string } }) {
  const router = useRouter();
  const [message, setMessage] = useState<FormMessage>();
  const form = useForm<CrewInput>({
    resolver: zodResolver(crewInputSchema),
    defaultValues: crew ? { name: crew.name, dailyCapacity: crew.dailyCapacity } : { name: '', dailyCapacity: 4 },
  });
  const onSubmit = form.handleSubmit(async (values) => {
    const result = crew
      ? await submitJson<{ id: string }>(`/api/crews/${crew.id}`, 'PATCH', values)
      : await submitJson<{ id: string }>('/api/crews', 'POST', values);
    if (!result.ok) return setMessage({ ok: false, text: applyServerErrors(result.error, form.setError) });
    if (!crew) return router.push(`/admin/crews/${result.data.id}`);
    setMessage({ ok: true, text: 'Saved.' });
    router.refresh();
  });
  return (
    <form onSubmit={onSubmit} noValidate className={cn(cardClass, 'grid max-w-2xl gap-4 md:grid-cols-2')}>
      <Field form={form} name="name" label="Crew name" />
      <Field
        form={form}
        name="dailyCapacity"
        label="Jobs per day"
        hint="The schedule marks days booked beyond this."
        type="number"
        min={1}
        step={1}
        valueAsNumber
      />
      <FormActions message={message} form={form} submitLabel={crew ? 'Save changes' : 'Create crew'} />
    </form>
  );
}
