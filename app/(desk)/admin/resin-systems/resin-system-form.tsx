'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch } from 'react-hook-form';
import { FormActions } from '@/components/desk/form-actions';
import { Field } from '@/components/desk/form-field';
import { useSaveRecord } from '@/components/desk/use-save-record';
import { RESIN_CHEMISTRIES, labelledOptions } from '@/lib/domain/vocabulary';
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
  const deg = unitLabels(unitSystem).temperature;
  const form = useForm<ResinSystemFormValues, unknown, ResinSystemInput>({
    resolver: zodResolver(resinSystemFormSchema(unitSystem)),
    defaultValues: initial ?? BLANK,
  });
  const kind = useWatch({ control: form.control, name: 'sensitivityKind' });
  const { message, save } = useSaveRecord(form.setError);

  const onSubmit = form.handleSubmit((values) =>
    save({
      collection: '/api/resin-systems',
      id,
      body: values,
      dirty: form.formState.dirtyFields,
      together: ['sensitivityKind', 'doublingC', 'activationEnergyKj'],
      next: (saved) => (id ? `/admin/resin-systems/${saved}` : '/admin/resin-systems'),
    }),
  );

  const num = (name: keyof ResinSystemFormValues, text: string, hint?: string) => (
    <Field form={form} name={name} label={text} hint={hint} decimal valueAsNumber />
  );

  return (
    <form onSubmit={onSubmit} noValidate className={cn(cardClass, 'grid max-w-3xl gap-4 md:grid-cols-3')}>
      <Field form={form} name="name" label="Name" autoFocus className="md:col-span-2" />
      <Field form={form} name="chemistry" label="Chemistry" choices={labelledOptions(RESIN_CHEMISTRIES)} />
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
      <Field form={form} name="sensitivityKind" label="Temperature sensitivity" as="select">
        <option value="doubling">Times halve every step warmer</option>
        <option value="arrhenius">Activation energy (Arrhenius)</option>
      </Field>
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
      <FormActions
        message={message}
        form={form}
        submitLabel={id ? 'Save changes' : 'Add resin system'}
        cancel
        className="md:col-span-3"
      />
    </form>
  );
}
