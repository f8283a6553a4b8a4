'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { saveSettings } from '@/components/materials/save-settings';
import { FormField, errorProps } from '@/components/desk/form-field';
import { Input } from '@/components/ui/input';
import { Button } from '@/components/ui/button';
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
  const router = useRouter();
  const [message, setMessage] = useState<string>();
  const { shortLength: len, pressure } = unitLabels(unitSystem);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting, dirtyFields },
  } = useForm<PackerFormValues, unknown, PackerInput>({
    resolver: zodResolver(packerFormSchema(unitSystem)),
    defaultValues: initial ?? BLANK,
  });
  const onSubmit = handleSubmit(async (values) => {
    const saved = await saveSettings({
      collection: '/api/packers',
      id,
      values,
      dirty: dirtyFields,
      setError,
      setMessage,
    });
    if (!saved) return;
    router.push(id ? `/admin/packers/${saved}` : '/admin/packers');
    router.refresh();
  });
  const num = (name: keyof PackerFormValues, text: string, hint?: string) => (
    <FormField id={name} label={text} error={errors[name]?.message} hint={hint}>
      <Input
        type="number"
        step="any"
        inputMode="decimal"
        {...register(name, { valueAsNumber: true })}
        {...errorProps(name, errors[name]?.message)}
      />
    </FormField>
  );
  return (
    <form onSubmit={onSubmit} noValidate className={cn(cardClass, 'grid max-w-3xl gap-4 md:grid-cols-2')}>
      <FormField id="name" label="Name" error={errors.name?.message}>
        <Input {...register('name')} {...errorProps('name', errors.name?.message)} autoFocus />
      </FormField>
      <FormField id="serial" label="Serial number" error={errors.serial?.message}>
        <Input {...register('serial')} {...errorProps('serial', errors.serial?.message)} />
      </FormField>
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
      {message && (
        <p role="alert" className="text-sm font-medium text-missed-700 md:col-span-2">
          {message}
        </p>
      )}
      <div className="flex gap-2 md:col-span-2">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? 'Saving…' : id ? 'Save changes' : 'Add packer'}
        </Button>
        <Button type="button" variant="secondary" onClick={() => router.back()}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
