'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { saveSettings } from '@/components/materials/save-settings';
import { FormField, errorProps } from '@/components/desk/form-field';
import { Input, Select } from '@/components/ui/input';
import { Button } from '@/components/ui/button';
import { RESIN_CHEMISTRIES, label } from '@/lib/domain/vocabulary';
import { DEFAULT_EXCESS_PCT, DEFAULT_RESIN_TO_FABRIC_RATIO } from '@/lib/sizing';
import { unitLabels, type UnitSystem } from '@/lib/units';
import {
  resinSystemFormSchema,
  type ResinSystemFormValues,
  type ResinSystemInput,
} from '@/lib/validation/resin-systems';
import { cardClass } from '@/components/ui/card';
import { cn } from '@/lib/ui/cn';

const BLANK: ResinSystemFormValues = {
  name: '',
  chemistry: 'epoxy',
  refTempC: Number.NaN,
  potLifeMin: Number.NaN,
  holdMin: Number.NaN,
  fullCureMin: Number.NaN,
  minTempC: Number.NaN,
  maxTempC: Number.NaN,
  sensitivityKind: 'doubling',
  doublingC: null,
  activationEnergyKj: null,
  resinToFabricRatio: DEFAULT_RESIN_TO_FABRIC_RATIO,
  resinExcessPct: DEFAULT_EXCESS_PCT,
  prepMinutes: 15,
};

/** New or edit. Temperatures are typed in the company's units and stored in °C; the doubling step is a temperature difference. */
export function ResinSystemForm({
  id,
  initial,
  unitSystem,
}: {
  id?: string;
  initial?: ResinSystemFormValues;
  unitSystem: UnitSystem;
}) {
  const router = useRouter();
  const [message, setMessage] = useState<string>();
  const deg = unitLabels(unitSystem).temperature;
  const {
    register,
    control,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting, dirtyFields },
  } = useForm<ResinSystemFormValues, unknown, ResinSystemInput>({
    resolver: zodResolver(resinSystemFormSchema(unitSystem)),
    defaultValues: initial ?? BLANK,
  });
  const kind = useWatch({ control, name: 'sensitivityKind' });

  const onSubmit = handleSubmit(async (values) => {
    const saved = await saveSettings({
      collection: '/api/resin-systems',
      id,
      values,
      dirty: dirtyFields,
      setError,
      setMessage,
      together: ['sensitivityKind', 'doublingC', 'activationEnergyKj'],
    });
    if (!saved) return;
    router.push(id ? `/admin/resin-systems/${saved}` : '/admin/resin-systems');
    router.refresh();
  });

  const num = (name: keyof ResinSystemFormValues, text: string, hint?: string) => (
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
    <form onSubmit={onSubmit} noValidate className={cn(cardClass, 'grid max-w-3xl gap-4 md:grid-cols-3')}>
      <div className="md:col-span-2">
        <FormField id="name" label="Name" error={errors.name?.message}>
          <Input {...register('name')} {...errorProps('name', errors.name?.message)} autoFocus />
        </FormField>
      </div>
      <FormField id="chemistry" label="Chemistry" error={errors.chemistry?.message}>
        <Select {...register('chemistry')} {...errorProps('chemistry', errors.chemistry?.message)}>
          {RESIN_CHEMISTRIES.map((c) => (
            <option key={c} value={c}>
              {label(c)}
            </option>
          ))}
        </Select>
      </FormField>
      <p className="text-xs text-slate-600 md:col-span-3">
        Times as the data sheet gives them at its reference temperature. Always follow the resin maker’s instructions;
        the clock only corrects them for temperature.
      </p>
      {num('refTempC', `Reference temperature (${deg})`)}
      {num('minTempC', `Lowest cure temperature (${deg})`)}
      {num('maxTempC', `Highest cure temperature (${deg})`)}
      {num('potLifeMin', 'Pot life (min)', 'Mix → latest inflate')}
      {num('holdMin', 'Hold (min)', 'Inflate → earliest deflate')}
      {num('fullCureMin', 'Full cure (min)', 'Inflate → back in service')}
      {num(
        'prepMinutes',
        'Mix to patch on packer (min)',
        'Wet-out and loading: the tablet’s default, counted in the GO / NO-GO',
      )}
      <FormField id="sensitivityKind" label="Temperature sensitivity" error={errors.sensitivityKind?.message}>
        <Select {...register('sensitivityKind')} {...errorProps('sensitivityKind', errors.sensitivityKind?.message)}>
          <option value="doubling">Times halve every step warmer</option>
          <option value="arrhenius">Activation energy (Arrhenius)</option>
        </Select>
      </FormField>
      {kind === 'arrhenius'
        ? num('activationEnergyKj', 'Activation energy (kJ/mol)')
        : num(
            'doublingC',
            `Halving step (${deg} warmer)`,
            unitSystem === 'imperial' ? 'Rule of thumb: 18 °F' : 'Rule of thumb: 10 °C',
          )}
      <p className="text-xs text-slate-600 md:col-span-3">
        Resin quantity: how the plan works out the resin to mix for a patch. Blank takes the common-practice values (1
        and 10 %).
      </p>
      {num('resinToFabricRatio', 'Resin to fabric (by volume)', '1 = as much resin as fabric')}
      {num('resinExcessPct', 'Extra mixed (%)', 'Left in the pot and on the wet-out sheet')}
      {message && (
        <p role="alert" className="text-sm font-medium text-missed-700 md:col-span-3">
          {message}
        </p>
      )}
      <div className="flex gap-2 md:col-span-3">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? 'Saving…' : id ? 'Save changes' : 'Add resin system'}
        </Button>
        <Button type="button" variant="secondary" onClick={() => router.back()}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
