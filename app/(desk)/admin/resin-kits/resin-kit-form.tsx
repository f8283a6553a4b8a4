'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { saveSettings } from '@/components/materials/save-settings';
import { FormField, errorProps } from '@/components/desk/form-field';
import { Input, Select, Textarea } from '@/components/ui/input';
import { Button } from '@/components/ui/button';
import { unitLabels, type UnitSystem } from '@/lib/units';
import { resinKitFormSchema, type ResinKitFormValues, type ResinKitInput } from '@/lib/validation/resin-kits';
import { KitLabelScan } from './kit-label-scan';
import { cardClass } from '@/components/ui/card';
import { cn } from '@/lib/ui/cn';

/** New or edit: the quantity on hand in US gallons or litres as the company works; stored in litres. */
export function ResinKitForm({
  id,
  initial,
  unitSystem,
  systems,
  scanned,
}: {
  id?: string;
  initial?: ResinKitFormValues;
  unitSystem: UnitSystem;
  systems: { id: string; name: string }[];
  /** Lot and expiry read from a label elsewhere (the new-kit link of the conditions step). */
  scanned?: { lot?: string; expiresOn?: string };
}) {
  const router = useRouter();
  const [message, setMessage] = useState<string>();
  const {
    register,
    handleSubmit,
    setError,
    setValue,
    formState: { errors, isSubmitting, dirtyFields },
  } = useForm<ResinKitFormValues, unknown, ResinKitInput>({
    resolver: zodResolver(resinKitFormSchema(unitSystem)),
    defaultValues: initial ?? {
      resinSystemId: systems[0]?.id ?? '',
      lot: scanned?.lot ?? '',
      expiresOn: scanned?.expiresOn ?? '',
      quantityL: Number.NaN,
      receivedOn: '',
      notes: '',
    },
  });
  const onSubmit = handleSubmit(async (values) => {
    const saved = await saveSettings({
      collection: '/api/resin-kits',
      id,
      values,
      dirty: dirtyFields,
      setError,
      setMessage,
    });
    if (!saved) return;
    router.push(`/admin/resin-kits/${saved}`);
    router.refresh();
  });
  return (
    <form onSubmit={onSubmit} noValidate className={cn(cardClass, 'grid max-w-3xl gap-4 md:grid-cols-2')}>
      <KitLabelScan
        editingId={id}
        onLabel={(label) => {
          if (label.lot) setValue('lot', label.lot, { shouldDirty: true, shouldValidate: true });
          if (label.expiresOn) setValue('expiresOn', label.expiresOn, { shouldDirty: true, shouldValidate: true });
        }}
      />
      <FormField id="lot" label="Lot number" error={errors.lot?.message}>
        <Input {...register('lot')} {...errorProps('lot', errors.lot?.message)} autoFocus />
      </FormField>
      <FormField id="resinSystemId" label="Resin system" error={errors.resinSystemId?.message}>
        <Select {...register('resinSystemId')} {...errorProps('resinSystemId', errors.resinSystemId?.message)}>
          {systems.map((s) => (
            <option key={s.id} value={s.id}>
              {s.name}
            </option>
          ))}
        </Select>
      </FormField>
      <FormField id="expiresOn" label="Use by (expiry date)" error={errors.expiresOn?.message}>
        <Input type="date" {...register('expiresOn')} {...errorProps('expiresOn', errors.expiresOn?.message)} />
      </FormField>
      <FormField id="receivedOn" label="Received on" error={errors.receivedOn?.message}>
        <Input type="date" {...register('receivedOn')} {...errorProps('receivedOn', errors.receivedOn?.message)} />
      </FormField>
      <FormField
        id="quantityL"
        label={`Quantity on hand (${unitLabels(unitSystem).volume})`}
        error={errors.quantityL?.message}
      >
        <Input
          type="number"
          step="any"
          min={0}
          inputMode="decimal"
          {...register('quantityL', { valueAsNumber: true })}
          {...errorProps('quantityL', errors.quantityL?.message)}
        />
      </FormField>
      <div className="md:col-span-2">
        <FormField id="notes" label="Notes (storage, supplier’s safety data sheet…)" error={errors.notes?.message}>
          <Textarea {...register('notes')} {...errorProps('notes', errors.notes?.message)} />
        </FormField>
      </div>
      <p className="text-xs text-slate-600 md:col-span-2">
        Resin components are chemicals: store and handle them as their safety data sheet says. The crew cannot pick a
        kit past its use-by date.
      </p>
      {message && (
        <p role="alert" className="text-sm font-medium text-missed-700 md:col-span-2">
          {message}
        </p>
      )}
      <div className="flex gap-2 md:col-span-2">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? 'Saving…' : id ? 'Save changes' : 'Add kit'}
        </Button>
        <Button type="button" variant="secondary" onClick={() => router.back()}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
