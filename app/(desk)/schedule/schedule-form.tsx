'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { FormField, errorProps } from '@/components/desk/form-field';
import { Input, Select } from '@/components/ui/input';
import { Button } from '@/components/ui/button';
import type { ScheduleJobResponse } from '@/lib/data/schedule';
import { applyServerErrors, submitJson } from '@/lib/client/submit-json';
import { label } from '@/lib/domain/vocabulary';
import { scheduleFormSchema } from '@/lib/validation/schedule';
import { cardClass } from '@/components/ui/card';

type Values = z.infer<typeof scheduleFormSchema>;
type JobOption = {
  id: string;
  number: string;
  customerName: string;
  status: string;
  crewId: string | null;
  scheduledDate: string | null;
  group: string;
};
type CrewOption = { id: string; name: string; dailyCapacity: number };
type Outcome = { tone: 'done' | 'over'; text: string };

/** "Schedule a job": pick the job, the crew and the day; PUT /api/jobs/:id/schedule checks it all again. */
export function ScheduleForm({
  jobs,
  crews,
  defaultDay,
}: {
  jobs: JobOption[];
  crews: CrewOption[];
  defaultDay: string;
}) {
  const router = useRouter();
  const [outcome, setOutcome] = useState<Outcome>();
  const [message, setMessage] = useState<string>();
  const {
    register,
    handleSubmit,
    setError,
    setValue,
    formState: { errors, isSubmitting },
  } = useForm<Values>({
    resolver: zodResolver(scheduleFormSchema),
    defaultValues: { jobId: '', crewId: '', date: defaultDay },
  });
  const groups = [...new Set(jobs.map((job) => job.group))];

  const onSubmit = handleSubmit(async ({ jobId, ...body }) => {
    setOutcome(undefined);
    setMessage(undefined);
    const result = await submitJson<ScheduleJobResponse>(`/api/jobs/${jobId}/schedule`, 'PUT', body);
    if (!result.ok) return setMessage(applyServerErrors(result.error, setError));
    const { job, crew, date, jobsThatDay, overCapacity } = result.data;
    setOutcome(
      overCapacity
        ? {
            tone: 'over',
            text:
              `Job ${job.number} is booked for ${crew.name} on ${date}, but that day is now over capacity: ${jobsThatDay} jobs for a capacity of ` +
              `${crew.dailyCapacity}.`,
          }
        : {
            tone: 'done',
            text: `Job ${job.number} is booked for ${crew.name} on ${date} (${jobsThatDay} of ${crew.dailyCapacity} jobs that day).`,
          },
    );
    setValue('jobId', '');
    router.refresh();
  });

  // Picking a job already on the board starts from its crew and day, so a move changes only what it must.
  const jobField = register('jobId', {
    onChange: (event: React.ChangeEvent<HTMLSelectElement>) => {
      const job = jobs.find((j) => j.id === event.target.value);
      if (job?.crewId) setValue('crewId', job.crewId);
      if (job?.scheduledDate) setValue('date', job.scheduledDate);
    },
  });

  return (
    <section aria-labelledby="schedule-form-heading" className={cardClass}>
      <h2 id="schedule-form-heading" className="mb-3 font-semibold">
        Schedule a job
      </h2>
      <form
        onSubmit={onSubmit}
        noValidate
        className="grid items-start gap-3 md:grid-cols-[minmax(0,2fr)_minmax(0,1fr)_minmax(0,1fr)_auto]"
      >
        <FormField id="jobId" label="Job" error={errors.jobId?.message}>
          <Select {...jobField} {...errorProps('jobId', errors.jobId?.message)} className="w-full">
            <option value="">Pick a job…</option>
            {groups.map((group) => (
              <optgroup key={group} label={group}>
                {jobs
                  .filter((job) => job.group === group)
                  .map((job) => (
                    <option key={job.id} value={job.id}>
                      {job.number} · {job.customerName} · {label(job.status)}
                      {job.scheduledDate ? ` · ${job.scheduledDate}` : ''}
                    </option>
                  ))}
              </optgroup>
            ))}
          </Select>
        </FormField>
        <FormField id="crewId" label="Crew" error={errors.crewId?.message}>
          <Select {...register('crewId')} {...errorProps('crewId', errors.crewId?.message)} className="w-full">
            <option value="">Pick a crew…</option>
            {crews.map((crew) => (
              <option key={crew.id} value={crew.id}>
                {crew.name} ({crew.dailyCapacity} jobs a day)
              </option>
            ))}
          </Select>
        </FormField>
        <FormField id="date" label="Day" error={errors.date?.message}>
          <Input type="date" {...register('date')} {...errorProps('date', errors.date?.message)} />
        </FormField>
        <div className="md:pt-6">
          <Button type="submit" disabled={isSubmitting}>
            {isSubmitting ? 'Scheduling…' : 'Schedule'}
          </Button>
        </div>
      </form>
      <div aria-live="polite" className="mt-3 text-sm">
        {outcome?.tone === 'done' && (
          <p className="rounded-md bg-safe-100 p-2 font-medium text-safe-700">{outcome.text}</p>
        )}
        {outcome?.tone === 'over' && (
          <p role="alert" className="rounded-md bg-near-100 p-2 font-medium text-near-700">
            Warning: {outcome.text}
          </p>
        )}
        {message && (
          <p role="alert" className="font-medium text-missed-700">
            {message}
          </p>
        )}
      </div>
    </section>
  );
}

/**
 * Takes one job off the board (back to the unscheduled list); the server refuses once installs have started.
 * Worded "Unassign" so its name never collides with the form's "Schedule" button.
 */
export function UnscheduleButton({ jobId, number }: { jobId: string; number: string }) {
  const router = useRouter();
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string>();
  async function unschedule() {
    setPending(true);
    setError(undefined);
    const result = await submitJson(`/api/jobs/${jobId}/schedule`, 'DELETE');
    setPending(false);
    if (!result.ok) return setError(result.error.message);
    router.refresh();
  }
  return (
    <>
      <button
        type="button"
        onClick={unschedule}
        disabled={pending}
        className="mt-1 text-xs text-slate-600 underline hover:text-slate-900 disabled:opacity-50"
      >
        {pending ? 'Unassigning…' : 'Unassign'}
        <span className="sr-only"> {number}</span>
      </button>
      {error && (
        <p role="alert" className="text-xs font-medium text-missed-700">
          {error}
        </p>
      )}
    </>
  );
}
