'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { FormActions } from '@/components/desk/form-actions';
import { Field } from '@/components/desk/form-field';
import { namedOptions } from '@/lib/domain/vocabulary';
import { useSaveRecord } from '@/components/desk/use-save-record';
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
  const form = useForm<ResinKitFormValues, unknown, ResinKitInput>({
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
  const { message, save } = useSaveRecord(form.setError);
  const onSubmit = form.handleSubmit((values) =>
    save({
      collection: '/api/resin-kits',
      id,
      body: values,
      dirty: form.formState.dirtyFields,
      next: (saved) => `/admin/resin-kits/${saved}`,
    }),
  );
  return (
    <form onSubmit={onSubmit} noValidate className={cn(cardClass, 'grid max-w-3xl gap-4 md:grid-cols-2')}>
      <KitLabelScan
        editingId={id}
        onLabel={(label) => {
          const options = { shouldDirty: true, shouldValidate: true };
          if (label.lot) form.setValue('lot', label.lot, options);
          if (label.expiresOn) form.setValue('expiresOn', label.expiresOn, options);
        }}
      />
      <Field form={form} name="lot" label="Lot number" autoFocus />
      <Field form={form} name="resinSystemId" label="Resin system" choices={namedOptions(systems)} />
      <Field form={form} name="expiresOn" label="Use by (expiry date)" type="date" />
      <Field form={form} name="receivedOn" label="Received on" type="date" />
      <Field
        form={form}
        name="quantityL"
        label={`Quantity on hand (${unitLabels(unitSystem).volume})`}
        decimal
        valueAsNumber
        min={0}
      />
      <Field
        form={form}
        name="notes"
        label="Notes (storage, supplier’s safety data sheet…)"
        as="textarea"
        className="md:col-span-2"
      />
      <p className="text-xs text-slate-600 md:col-span-2">
        Resin components are chemicals: store and handle them as their safety data sheet says. The crew cannot pick a
        kit past its use-by date.
      </p>
      <FormActions message={message} form={form} submitLabel={id ? 'Save changes' : 'Add kit'} cancel />
    </form>
  );
}
