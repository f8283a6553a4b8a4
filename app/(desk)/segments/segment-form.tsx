'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { useCloseEditSection } from '@/components/desk/edit-section';
import { FormField, errorProps } from '@/components/desk/form-field';
import { Input, Select } from '@/components/ui/input';
import { Button } from '@/components/ui/button';
import { applyServerErrors, submitJson } from '@/lib/client/submit-json';
import { PIPE_MATERIALS, label } from '@/lib/domain/vocabulary';
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
  const router = useRouter();
  const closeEdit = useCloseEditSection();
  const [message, setMessage] = useState<string>();
  const schema = useMemo(() => segmentFormSchema(unitSystem), [unitSystem]);
  const units = unitLabels(unitSystem);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting, dirtyFields },
  } = useForm<z.input<typeof schema>, unknown, z.output<typeof schema>>({
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

  const onSubmit = handleSubmit(async (values) => {
    // An edit sends only what the user changed: a size shown rounded (8 in for 203 mm) and left alone stays as stored.
    const patch = Object.fromEntries(
      Object.entries(values).filter(([field]) => field !== 'siteId' && dirtyFields[field as keyof typeof dirtyFields]),
    );
    const result = segment
      ? await submitJson<{ id: string }>(`/api/segments/${segment.id}`, 'PATCH', patch)
      : await submitJson<{ id: string }>('/api/segments', 'POST', values);
    if (!result.ok) return setMessage(applyServerErrors(result.error, setError));
    closeEdit?.();
    router.push(`/segments/${result.data.id}`);
    router.refresh();
  });

  const number = (
    name: 'nominalSizeMm' | 'insideDiameterMm' | 'lengthMm' | 'depthMm',
    text: string,
    unit: string,
    hint: string,
  ) => (
    <FormField id={name} label={text} error={errors[name]?.message} hint={`${hint} (${unit})`}>
      <Input
        type="number"
        step="any"
        inputMode="decimal"
        min={0}
        {...register(name)}
        {...errorProps(name, errors[name]?.message)}
      />
    </FormField>
  );

  return (
    <form onSubmit={onSubmit} noValidate className={cn(cardClass, 'grid max-w-2xl gap-4 md:grid-cols-2')}>
      <div className="md:col-span-2">
        <FormField
          id="label"
          label="Label"
          error={errors.label?.message}
          hint="How the crew names the run, e.g. MH-1 → MH-2"
        >
          <Input {...register('label')} {...errorProps('label', errors.label?.message)} autoFocus />
        </FormField>
      </div>
      <FormField
        id="fromAccessPointId"
        label="From access point"
        error={errors.fromAccessPointId?.message}
        hint="The end the crew works from (upstream, usually)"
      >
        <Select
          {...register('fromAccessPointId')}
          {...errorProps('fromAccessPointId', errors.fromAccessPointId?.message)}
        >
          <option value="">Pick an access point…</option>
          {accessPoints.map((point) => (
            <option key={point.id} value={point.id}>
              {point.label}
            </option>
          ))}
        </Select>
      </FormField>
      <FormField id="toAccessPointId" label="To access point" error={errors.toAccessPointId?.message}>
        <Select {...register('toAccessPointId')} {...errorProps('toAccessPointId', errors.toAccessPointId?.message)}>
          <option value="">None — open end (e.g. a lateral into the main)</option>
          {accessPoints.map((point) => (
            <option key={point.id} value={point.id}>
              {point.label}
            </option>
          ))}
        </Select>
      </FormField>
      <FormField id="material" label="Material" error={errors.material?.message}>
        <Select {...register('material')} {...errorProps('material', errors.material?.message)}>
          {PIPE_MATERIALS.map((material) => (
            <option key={material} value={material}>
              {label(material)}
            </option>
          ))}
        </Select>
      </FormField>
      {number('nominalSizeMm', 'Nominal size', units.shortLength, 'Trade size')}
      {number('insideDiameterMm', 'Inside diameter', units.shortLength, 'Measured, after cleaning')}
      {number('lengthMm', 'Length', units.longLength, 'Between the two access points')}
      {number('depthMm', 'Depth', units.longLength, 'To the invert, if known')}
      {message && (
        <p role="alert" className="text-sm font-medium text-missed-700 md:col-span-2">
          {message}
        </p>
      )}
      <div className="flex gap-2 md:col-span-2">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? 'Saving…' : segment ? 'Save changes' : 'Create segment'}
        </Button>
        <Button type="button" variant="secondary" onClick={() => (closeEdit ? closeEdit() : router.back())}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
