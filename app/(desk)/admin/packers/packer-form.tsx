'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { FormActions } from '@/components/desk/form-actions';
import { Field } from '@/components/desk/form-field';
import { useSaveRecord } from '@/components/desk/use-save-record';
import { unitLabels, type UnitSystem } from '@/lib/units';
import { packerFormSchema, type PackerFormValues, type PackerInput } from '@/lib/validation/packers';
import { cardClass } from '@/components/ui/card';
import { cn } from '@/lib/ui/cn';

const BLANK: PackerFormValues = {
  name: '',
  serial: '',
  minDiameterMm: Number.NaN,
  maxDiameterMm: Number.NaN,
  bladderLengthMm: Number.NaN,
  endMarginMm: Number.NaN,
  minPressureKpa: Number.NaN,
  maxPressureKpa: Number.NaN,
};

/** New or edit: lengths in inches or mm, pressures in psi or kPa, as the company works; stored in mm and kPa. */
export function PackerForm({
  id,
  initial,
  unitSystem,
}: {
  id?: string;
  initial?: PackerFormValues;
  unitSystem: UnitSystem;
}) {
  const { shortLength: len, pressure } = unitLabels(unitSystem);
  const form = useForm<PackerFormValues, unknown, PackerInput>({
    resolver: zodResolver(packerFormSchema(unitSystem)),
    defaultValues: initial ?? BLANK,
  });
  const { message, save } = useSaveRecord(form.setError);
  const onSubmit = form.handleSubmit((values) =>
    save({
      collection: '/api/packers',
      id,
      body: values,
      dirty: form.formState.dirtyFields,
      next: (saved) => (id ? `/admin/packers/${saved}` : '/admin/packers'),
    }),
  );
  const num = (name: keyof PackerFormValues, text: string) => (
    <Field form={form} name={name} label={text} decimal valueAsNumber />
  );
  return (
    <form onSubmit={onSubmit} noValidate className={cn(cardClass, 'grid max-w-3xl gap-4 md:grid-cols-2')}>
      <Field form={form} name="name" label="Name" autoFocus />
      <Field form={form} name="serial" label="Serial number" />
      {num('minDiameterMm', `Smallest pipe inside diameter (${len})`)}
      {num('maxDiameterMm', `Largest pipe inside diameter (${len})`)}
      {num('bladderLengthMm', `Bladder length (${len})`)}
      {num('endMarginMm', `Bare bladder at each end of the patch (${len})`)}
      {num('minPressureKpa', `Lowest inflation pressure (${pressure})`)}
      {num('maxPressureKpa', `Highest inflation pressure (${pressure})`)}
      <p className="text-xs text-slate-600 md:col-span-2">
        Enter the maker’s rating. A pressurised bladder can burst or move suddenly: never exceed its rating, and follow
        the maker’s instructions and local codes.
      </p>
      <FormActions message={message} form={form} submitLabel={id ? 'Save changes' : 'Add packer'} cancel />
    </form>
  );
}
