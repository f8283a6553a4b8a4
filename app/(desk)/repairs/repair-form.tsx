'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { FormActions } from '@/components/desk/form-actions';
import { Field } from '@/components/desk/form-field';
import { useSaveRecord } from '@/components/desk/use-save-record';
import type { ApiFailure } from '@/lib/client/submit-json';
import { DEFECT_TYPES, labelledOptions } from '@/lib/domain/vocabulary';
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
  const units = unitLabels(unitSystem);
  const form = useForm<Input, unknown, Output>({
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
  const { message, save } = useSaveRecord(form.setError);

  const onSubmit = form.handleSubmit(({ distance, defectLength, ...rest }) => {
    const body = {
      ...rest,
      distanceMm: lengthToSi(distance, unitSystem, 'long'),
      defectLengthMm: lengthToSi(defectLength, unitSystem, 'short'),
    };
    return save({
      collection: '/api/repairs',
      id: repairId,
      body: repairId ? body : { ...body, jobId },
      next: (id) => `/repairs/${id}`,
      rename: renamed,
    });
  });

  return (
    <form onSubmit={onSubmit} noValidate className={cn(cardClass, 'grid max-w-2xl gap-4 md:grid-cols-2')}>
      <Field
        form={form}
        name="segmentId"
        label="Segment"
        as="select"
        hint={segments.length === 0 ? 'This site has no segments yet: add one on the site’s page.' : undefined}
        autoFocus
        className="md:col-span-2"
      >
        <option value="">Pick a segment…</option>
        {segments.map((s) => (
          <option key={s.id} value={s.id}>
            {s.label} · {formatLength(s.insideDiameterMm, unitSystem)} ID ·{' '}
            {formatLength(s.lengthMm, unitSystem, 'long')} long
          </option>
        ))}
      </Field>
      <Field
        form={form}
        name="distance"
        label="Distance from access point"
        hint={`In ${units.longLength}, from the segment’s start`}
        decimal
        valueAsNumber
      />
      <Field form={form} name="defectType" label="Defect type" choices={labelledOptions(DEFECT_TYPES)} />
      <Field
        form={form}
        name="conditionGrade"
        label="Condition grade"

        hint="1 = minor … 5 = severe"
        valueAsNumber
        choices={[1, 2, 3, 4, 5].map((grade) => ({ value: grade, label: grade }))}
      />
      <Field
        form={form}
        name="defectLength"
        label="Defect length"
        hint={`In ${units.shortLength}`}
        decimal
        valueAsNumber
      />
      <Field
        form={form}
        name="clockPosition"
        label="Clock position"
        hint="Looking downstream: 12 is the crown, e.g. 3 or 11-1"
      />
      <Field
        form={form}
        name="ownerDefectCode"
        label="Owner’s defect code (optional)"
        hint="Only when the owner requires its own coding: kept exactly as typed"
        autoComplete="off"
      />
      <Field form={form} name="notes" label="Notes" as="textarea" className="md:col-span-2" />
      <FormActions message={message} form={form} submitLabel={repairId ? 'Save changes' : 'Create repair'} cancel />
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
