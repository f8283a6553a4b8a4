'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { PlainTable } from '@/components/ui/plain-table';
import { useRouter } from 'next/navigation';
import { useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { FormField, errorProps } from '@/components/desk/form-field';
import { Input, Select } from '@/components/ui/input';
import { Button } from '@/components/ui/button';
import { applyServerErrors, submitJson } from '@/lib/client/submit-json';
import { ACCESS_POINT_KINDS, label } from '@/lib/domain/vocabulary';
import { formatLength, unitLabels, type UnitSystem } from '@/lib/units';
import { mmToEntered } from '@/lib/units/entry';
import { accessPointFormSchema } from '@/lib/validation/access-points';
import { cn } from '@/lib/ui/cn';

type Point = { id: string; label: string; kind: string; depthMm: number | null };

/**
 * The site's access points: a table with edit and remove on each row and an inline form to add one.
 * While a row is being edited the add form steps aside, so each label on screen names one control.
 */
export function AccessPointsPanel({
  siteId,
  accessPoints,
  unitSystem,
}: {
  siteId: string;
  accessPoints: Point[];
  unitSystem: UnitSystem;
}) {
  const router = useRouter();
  const [editing, setEditing] = useState<string | null>(null);
  const [message, setMessage] = useState<string>();

  const remove = async (point: Point) => {
    if (!window.confirm(`Remove access point ${point.label}?`)) return;
    const result = await submitJson(`/api/access-points/${point.id}`, 'DELETE');
    setMessage(result.ok ? `${point.label} removed.` : result.error.message);
    router.refresh();
  };

  return (
    <section aria-labelledby="access-points-heading" className="space-y-2">
      <h2 id="access-points-heading" className="text-lg font-semibold">
        Access points
      </h2>
      <PlainTable
        caption="Access points of this site"
        headers={[
          'Label',
          'Kind',
          'Depth',
          <span key="actions" className="sr-only">
            Actions
          </span>,
        ]}
      >
        {accessPoints.map((point) =>
          editing === point.id ? (
            <tr key={point.id}>
              <td colSpan={4} className="px-3 py-2">
                <AccessPointForm
                  siteId={siteId}
                  point={point}
                  unitSystem={unitSystem}
                  onDone={() => setEditing(null)}
                />
              </td>
            </tr>
          ) : (
            <tr key={point.id}>
              <td className="px-3 py-2 font-semibold">{point.label}</td>
              <td className="px-3 py-2">{label(point.kind)}</td>
              <td className="px-3 py-2">
                {point.depthMm === null ? '—' : formatLength(point.depthMm, unitSystem, 'long')}
              </td>
              <td className="px-3 py-2 text-right">
                <Button
                  type="button"
                  variant="ghost"
                  onClick={() => {
                    setMessage(undefined);
                    setEditing(point.id);
                  }}
                  aria-label={`Edit ${point.label}`}
                >
                  Edit
                </Button>
                <Button
                  type="button"
                  variant="ghost"
                  onClick={() => remove(point)}
                  aria-label={`Remove ${point.label}`}
                >
                  Remove
                </Button>
              </td>
            </tr>
          ),
        )}
        {accessPoints.length === 0 && (
          <tr>
            <td colSpan={4} className="px-3 py-4 text-slate-500">
              No access points yet.
            </td>
          </tr>
        )}
      </PlainTable>
      {message && (
        <p role="status" className="text-sm text-slate-700">
          {message}
        </p>
      )}
      {editing === null && <AccessPointForm siteId={siteId} unitSystem={unitSystem} />}
    </section>
  );
}

/** Add (no `point`) or edit one access point; depth is entered in the company's long unit. */
function AccessPointForm({
  siteId,
  point,
  unitSystem,
  onDone,
}: {
  siteId: string;
  point?: Point;
  unitSystem: UnitSystem;
  onDone?: () => void;
}) {
  const router = useRouter();
  const [message, setMessage] = useState<{ text: string; failed: boolean }>();
  const schema = useMemo(() => accessPointFormSchema(unitSystem), [unitSystem]);
  const empty = { label: '', kind: 'manhole', depthMm: '' };
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm<z.input<typeof schema>, unknown, z.output<typeof schema>>({
    resolver: zodResolver(schema),
    defaultValues: point
      ? { label: point.label, kind: point.kind, depthMm: mmToEntered(point.depthMm, unitSystem, 'long') ?? '' }
      : empty,
  });
  const prefix = point ? 'edit-ap' : 'ap';

  const onSubmit = handleSubmit(async (values) => {
    const result = point
      ? await submitJson(`/api/access-points/${point.id}`, 'PATCH', values)
      : await submitJson(`/api/sites/${siteId}/access-points`, 'POST', values);
    if (!result.ok) return setMessage({ text: applyServerErrors(result.error, setError), failed: true });
    setMessage(point ? undefined : { text: `${values.label} added.`, failed: false });
    if (!point) reset(empty);
    onDone?.();
    router.refresh();
  });

  return (
    <form
      onSubmit={onSubmit}
      noValidate
      aria-label={point ? `Edit access point ${point.label}` : 'Add access point'}
      className="flex flex-wrap items-start gap-3 rounded-lg bg-white p-3 ring-1 ring-slate-200"
    >
      <FormField id={`${prefix}-label`} label="Label" error={errors.label?.message}>
        <Input
          {...register('label')}
          {...errorProps(`${prefix}-label`, errors.label?.message)}
          className="w-32"
          placeholder="MH-1"
        />
      </FormField>
      <FormField id={`${prefix}-kind`} label="Kind" error={errors.kind?.message}>
        <Select {...register('kind')} {...errorProps(`${prefix}-kind`, errors.kind?.message)}>
          {ACCESS_POINT_KINDS.map((kind) => (
            <option key={kind} value={kind}>
              {label(kind)}
            </option>
          ))}
        </Select>
      </FormField>
      <FormField
        id={`${prefix}-depth`}
        label="Depth"
        error={errors.depthMm?.message}
        hint={`Rim to invert, ${unitLabels(unitSystem).longLength}`}
      >
        <Input
          type="number"
          step="any"
          inputMode="decimal"
          min={0}
          {...register('depthMm')}
          {...errorProps(`${prefix}-depth`, errors.depthMm?.message)}
          className="w-28"
        />
      </FormField>
      <div className="flex gap-2 pt-6">
        <Button type="submit" disabled={isSubmitting}>
          {point ? 'Save changes' : 'Add access point'}
        </Button>
        {point && (
          <Button type="button" variant="secondary" onClick={onDone}>
            Cancel
          </Button>
        )}
      </div>
      {message && (
        <p
          role={message.failed ? 'alert' : 'status'}
          className={cn('basis-full text-sm font-medium', message.failed ? 'text-missed-700' : 'text-slate-700')}
        >
          {message.text}
        </p>
      )}
    </form>
  );
}
