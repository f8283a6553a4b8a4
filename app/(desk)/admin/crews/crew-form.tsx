'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { FormField, errorProps } from '@/components/desk/form-field';
import { Input } from '@/components/ui/input';
import { Button } from '@/components/ui/button';
import { applyServerErrors, submitJson } from '@/lib/client/submit-json';
import { crewInputSchema, type CrewInput } from '@/lib/validation/crews';
import { cn } from '@/lib/ui/cn';
import { cardClass } from '@/components/ui/card';

/** New or edit: the same schema as POST /api/crews (PATCH takes the same fields). */
export function CrewForm({ crew }: { crew?: CrewInput & { id: string } }) {
  const router = useRouter();
  const [message, setMessage] = useState<{ ok: boolean; text: string }>();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<CrewInput>({
    resolver: zodResolver(crewInputSchema),
    defaultValues: crew ? { name: crew.name, dailyCapacity: crew.dailyCapacity } : { name: '', dailyCapacity: 4 },
  });
  const onSubmit = handleSubmit(async (values) => {
    const result = crew
      ? await submitJson<{ id: string }>(`/api/crews/${crew.id}`, 'PATCH', values)
      : await submitJson<{ id: string }>('/api/crews', 'POST', values);
    if (!result.ok) return setMessage({ ok: false, text: applyServerErrors(result.error, setError) });
    if (!crew) return router.push(`/admin/crews/${result.data.id}`);
    setMessage({ ok: true, text: 'Saved.' });
    router.refresh();
  });
  return (
    <form onSubmit={onSubmit} noValidate className={cn(cardClass, 'grid max-w-2xl gap-4 md:grid-cols-2')}>
      <FormField id="name" label="Crew name" error={errors.name?.message}>
        <Input {...register('name')} {...errorProps('name', errors.name?.message)} />
      </FormField>
      <FormField
        id="dailyCapacity"
        label="Jobs per day"
        error={errors.dailyCapacity?.message}
        hint="The schedule marks days booked beyond this."
      >
        <Input
          type="number"
          min={1}
          step={1}
          {...register('dailyCapacity', { valueAsNumber: true })}
          {...errorProps('dailyCapacity', errors.dailyCapacity?.message)}
        />
      </FormField>
      {message && (
        <p
          role={message.ok ? 'status' : 'alert'}
          className={cn('text-sm font-medium md:col-span-2', message.ok ? 'text-safe-700' : 'text-missed-700')}
        >
          {message.text}
        </p>
      )}
      <div className="md:col-span-2">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? 'Saving…' : crew ? 'Save changes' : 'Create crew'}
        </Button>
      </div>
    </form>
  );
}
