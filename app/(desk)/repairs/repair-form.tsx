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
import { applyServerErrors, submitJson, type ApiFailure } from '@/lib/client/submit-json';
import { DEFECT_TYPES, label } from '@/lib/domain/vocabulary';
import { formatLength, lengthToSi, unitLabels, type UnitSystem } from '@/lib/units';
import { REPAIR_FORM_FIELDS, repairFormSchema } from '@/lib/validation/repairs';
import { cardClass } from '@/components/ui/card';
import { cn } from '@/lib/ui/cn';

type Input = z.input<ReturnType<typeof repairFormSchema>>;
type Output = z.output<ReturnType<typeof repairFormSchema>>;
type SegmentOption = { id: string; label: string; insideDiameterMm: number; lengthMm: number };

/**
 * New repair on a job, or edit of one. Lengths are typed in the company's units and sent to the API in
 * millimetres; the API's field messages are put back on the matching inputs.
 */
export function RepairForm({
  jobId,
  repairId,
  segments,
  unitSystem,
  initial,
}: {
  jobId: string;
  repairId?: string;
  segments: SegmentOption[];
  unitSystem: UnitSystem;
  initial?: Partial<Input>;
}) {
  const router = useRouter();
  const closeEdit = useCloseEditSection();
  const [message, setMessage] = useState<string>();
  const units = unitLabels(unitSystem);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<Input, unknown, Output>({
    resolver: zodResolver(repairFormSchema(unitSystem)),
    defaultValues: initial ?? {
      segmentId: segments.length === 1 ? segments[0].id : '',
      defectType: 'open_fracture',
      conditionGrade: 3,
      clockPosition: '',
      notes: '',
      ownerDefectCode: '',
    },
  });

  const onSubmit = handleSubmit(async ({ distance, defectLength, ...rest }) => {
    const body = {
      ...rest,
      distanceMm: lengthToSi(distance, unitSystem, 'long'),
      defectLengthMm: lengthToSi(defectLength, unitSystem, 'short'),
    };
    const result = repairId
      ? await submitJson<{ id: string }>(`/api/repairs/${repairId}`, 'PATCH', body)
      : await submitJson<{ id: string }>('/api/repairs', 'POST', { ...body, jobId });
    if (!result.ok) return setMessage(applyServerErrors(renamed(result.error), setError));
    closeEdit?.();
    router.push(`/repairs/${result.data.id}`);
    router.refresh();
  });

  const field = (id: keyof Input) => errorProps(id, errors[id]?.message);
  return (
    <form onSubmit={onSubmit} noValidate className={cn(cardClass, 'grid max-w-2xl gap-4 md:grid-cols-2')}>
      <div className="md:col-span-2">
        <FormField
          id="segmentId"
          label="Segment"
          error={errors.segmentId?.message}
          hint={segments.length === 0 ? 'This site has no segments yet: add one on the site’s page.' : undefined}
        >
          <Select {...register('segmentId')} {...field('segmentId')} autoFocus>
            <option value="">Pick a segment…</option>
            {segments.map((s) => (
              <option key={s.id} value={s.id}>
                {s.label} · {formatLength(s.insideDiameterMm, unitSystem)} ID ·{' '}
                {formatLength(s.lengthMm, unitSystem, 'long')} long
              </option>
            ))}
          </Select>
        </FormField>
      </div>
      <FormField
        id="distance"
        label="Distance from access point"
        error={errors.distance?.message}
        hint={`In ${units.longLength}, from the segment’s start`}
      >
        <TextInput
          type="number"
          step="any"
          inputMode="decimal"
          {...register('distance', { valueAsNumber: true })}
          {...field('distance')}
        />
      </FormField>
      <FormField id="defectType" label="Defect type" error={errors.defectType?.message}>
        <Select {...register('defectType')} {...field('defectType')}>
          {DEFECT_TYPES.map((type) => (
            <option key={type} value={type}>
              {label(type)}
            </option>
          ))}
        </Select>
      </FormField>
      <FormField
        id="conditionGrade"
        label="Condition grade"
        error={errors.conditionGrade?.message}
        hint="1 = minor … 5 = severe"
      >
        <Select {...register('conditionGrade', { valueAsNumber: true })} {...field('conditionGrade')}>
          {[1, 2, 3, 4, 5].map((grade) => (
            <option key={grade} value={grade}>
              {grade}
            </option>
          ))}
        </Select>
      </FormField>
      <FormField
        id="defectLength"
        label="Defect length"
        error={errors.defectLength?.message}
        hint={`In ${units.shortLength}`}
      >
        <TextInput
          type="number"
          step="any"
          inputMode="decimal"
          {...register('defectLength', { valueAsNumber: true })}
          {...field('defectLength')}
        />
      </FormField>
      <FormField
        id="clockPosition"
        label="Clock position"
        error={errors.clockPosition?.message}
        hint="Looking downstream: 12 is the crown, e.g. 3 or 11-1"
      >
        <TextInput {...register('clockPosition')} {...field('clockPosition')} />
      </FormField>
      <FormField
        id="ownerDefectCode"
        label="Owner’s defect code (optional)"
        error={errors.ownerDefectCode?.message}
        hint="Only when the owner requires its own coding: kept exactly as typed"
      >
        <TextInput {...register('ownerDefectCode')} {...field('ownerDefectCode')} autoComplete="off" />
      </FormField>
      <div className="md:col-span-2">
        <FormField id="notes" label="Notes" error={errors.notes?.message}>
          <Textarea {...register('notes')} {...field('notes')} />
        </FormField>
      </div>
      {message && (
        <p role="alert" className="text-sm font-medium text-missed-700 md:col-span-2">
          {message}
        </p>
      )}
      <div className="flex gap-2 md:col-span-2">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? 'Saving…' : repairId ? 'Save changes' : 'Create repair'}
        </Button>
        <Button type="button" variant="secondary" onClick={() => (closeEdit ? closeEdit() : router.back())}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

/** The API names SI fields (distanceMm); the form's inputs are in display units (distance). */
function renamed(error: ApiFailure): ApiFailure {
  if (!error.fields) return error;
  return {
    ...error,
    fields: Object.fromEntries(
      Object.entries(error.fields).map(([key, messages]) => [REPAIR_FORM_FIELDS[key] ?? key, messages]),
    ),
  };
}
