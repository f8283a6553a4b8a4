'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useMemo } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { FormActions } from '@/components/desk/form-actions';
import { Field } from '@/components/desk/form-field';
import { useSaveRecord } from '@/components/desk/use-save-record';
import { PIPE_MATERIALS, labelledOptions } from '@/lib/domain/vocabulary';
import { unitLabels, type UnitSystem } from '@/lib/units';
import { mmToEntered, nominalToEntered } from '@/lib/units/entry';
import { segmentFormSchema } from '@/lib/validation/segments';
import { cardClass } from '@/components/ui/card';
import { cn } from '@/lib/ui/cn';

type Point = { id: string; label: string };
type Stored = {
  id: string;
  siteId: string;
  label: string;
  fromAccessPointId: string;
  toAccessPointId: string | null;
  material: string;
  nominalSizeMm: number;
  insideDiameterMm: number;
  lengthMm: number;
  depthMm: number | null;
};

/**
 * New or edit. Sizes are typed in the company's units (in/ft or mm/m) and sent in SI; the form's
 * schema converts, then runs the API's own schema, so the browser and the server report the same fields.
 */
export function SegmentForm({
  siteId,
  accessPoints,
  unitSystem,
  segment,
}: {
  siteId: string;
  accessPoints: Point[];
  unitSystem: UnitSystem;
  segment?: Stored;
}) {
  const schema = useMemo(() => segmentFormSchema(unitSystem), [unitSystem]);
  const units = unitLabels(unitSystem);
  const form = useForm<z.input<typeof schema>, unknown, z.output<typeof schema>>({
    resolver: zodResolver(schema),
    defaultValues: segment
      ? {
          ...segment,
          toAccessPointId: segment.toAccessPointId ?? '',
          nominalSizeMm: nominalToEntered(segment.nominalSizeMm, unitSystem),
          insideDiameterMm: mmToEntered(segment.insideDiameterMm, unitSystem, 'short'),
          lengthMm: mmToEntered(segment.lengthMm, unitSystem, 'long'),
          depthMm: mmToEntered(segment.depthMm, unitSystem, 'long') ?? '',
        }
      : {
          siteId,
          label: '',
          fromAccessPointId: accessPoints[0]?.id ?? '',
          toAccessPointId: accessPoints[1]?.id ?? '',
          material: 'vitrified_clay',
          nominalSizeMm: '',
          insideDiameterMm: '',
          lengthMm: '',
          depthMm: '',
        },
  });

  const { message, save } = useSaveRecord(form.setError);
  const { dirtyFields } = form.formState;

  const onSubmit = form.handleSubmit((values) => {
    // An edit sends only what the user changed: a size shown rounded (8 in for 203 mm) and left alone stays as stored.
    const patch = Object.fromEntries(
      Object.entries(values).filter(([field]) => field !== 'siteId' && dirtyFields[field as keyof typeof dirtyFields]),
    );
    const body = segment ? patch : values;
    return save({ collection: '/api/segments', id: segment?.id, body, next: (id) => `/segments/${id}` });
  });

  const number = (
    name: 'nominalSizeMm' | 'insideDiameterMm' | 'lengthMm' | 'depthMm',
    text: string,
    unit: string,
    hint: string,
  ) => <Field form={form} name={name} label={text} hint={`${hint} (${unit})`} decimal min={0} />;

  return (
    <form onSubmit={onSubmit} noValidate className={cn(cardClass, 'grid max-w-2xl gap-4 md:grid-cols-2')}>
      <Field
        form={form}
        name="label"
        label="Label"
        hint="How the crew names the run, e.g. MH-1 → MH-2"
        autoFocus
        className="md:col-span-2"
      />
      <Field
        form={form}
        name="fromAccessPointId"
        label="From access point"

        hint="The end the crew works from (upstream, usually)"
        choices={accessPoints.map((point) => ({ value: point.id, label: point.label }))}
      >
        <option value="">Pick an access point…</option>
      </Field>
      <Field
        form={form}
        name="toAccessPointId"
        label="To access point"
        choices={accessPoints.map((point) => ({ value: point.id, label: point.label }))}
      >
        <option value="">None — open end (e.g. a lateral into the main)</option>
      </Field>
      <Field form={form} name="material" label="Material" choices={labelledOptions(PIPE_MATERIALS)} />
      {number('nominalSizeMm', 'Nominal size', units.shortLength, 'Trade size')}
      {number('insideDiameterMm', 'Inside diameter', units.shortLength, 'Measured, after cleaning')}
      {number('lengthMm', 'Length', units.longLength, 'Between the two access points')}
      {number('depthMm', 'Depth', units.longLength, 'To the invert, if known')}
      <FormActions message={message} form={form} submitLabel={segment ? 'Save changes' : 'Create segment'} cancel />
    </form>
  );
}
