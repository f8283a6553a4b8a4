'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { FormActions, type FormMessage } from '@/components/desk/form-actions';
import { Field, FormField, errorProps } from '@/components/desk/form-field';
import { Select } from '@/components/ui/input';
import { applyServerErrors, submitJson } from '@/lib/client/submit-json';
import { UNIT_SYSTEMS, type UnitSystemName } from '@/lib/domain/vocabulary';
import { lengthFromSi, lengthToSi, unitLabels } from '@/lib/units';
import {
  companyFormSchema,
  formToCompanyPatch,
  modulusInSystem,
  type CompanyFormValues,
} from '@/lib/validation/company';
import { cn } from '@/lib/ui/cn';
import { cardClass } from '@/components/ui/card';

// The API names its fields in SI; the form's own fields carry the entered units.
const SERVER_FIELD: Record<string, keyof CompanyFormValues> = {
  minOverlapPerEndMm: 'minOverlapPerEnd',
  workingWindowSafetyMargin: 'safetyMarginPercent',
  holdReserve: 'holdReservePercent',
  linerShortTermModulusMpa: 'linerModulus',
};

/** The company's settings; lengths are entered in the unit system picked here and sent to PATCH /api/company in millimetres. */
export function CompanyForm({ initial, timeZones }: { initial: CompanyFormValues; timeZones: string[] }) {
  const router = useRouter();
  const [message, setMessage] = useState<FormMessage>();
  const form = useForm<CompanyFormValues>({
    resolver: zodResolver(companyFormSchema),
    defaultValues: initial,
  });
  const { register, setError, setValue, getValues } = form;
  const { errors } = form.formState;
  const unitSystem = useWatch({ control: form.control, name: 'unitSystem' });
  const lengthUnit = unitLabels(unitSystem).shortLength;

  // Switching the unit system keeps the overlap the same length, shown in the new unit.
  const unitField = register('unitSystem');
  const onUnitChange = (event: React.ChangeEvent<HTMLSelectElement>) => {
    const before = getValues('unitSystem');
    const next = event.target.value as UnitSystemName;
    const overlap = getValues('minOverlapPerEnd');
    if (Number.isFinite(overlap) && before !== next) {
      setValue('minOverlapPerEnd', Math.round(lengthFromSi(lengthToSi(overlap, before), next) * 100) / 100);
    }
    if (before !== next) setValue('linerModulus', modulusInSystem(getValues('linerModulus'), before, next));
    return unitField.onChange(event);
  };

  const onSubmit = form.handleSubmit(async (values) => {
    setMessage(undefined);
    const result = await submitJson('/api/company', 'PATCH', formToCompanyPatch(values));
    if (!result.ok) {
      const fields = Object.fromEntries(
        Object.entries(result.error.fields ?? {}).map(([key, value]) => [SERVER_FIELD[key] ?? key, value]),
      );
      return setMessage({ ok: false, text: applyServerErrors({ ...result.error, fields }, setError) });
    }
    setMessage({ ok: true, text: 'Settings saved.' });
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className={cn(cardClass, 'grid max-w-2xl gap-4 md:grid-cols-2')}>
      <Field form={form} name="name" label="Company name" />
      <Field
        form={form}
        name="timeZone"
        label="Time zone"

        hint="Times are stored in UTC and shown in this zone."
        choices={timeZones.map((zone) => ({ value: zone, label: zone }))}
      />
      <FormField id="unitSystem" label="Units" error={errors.unitSystem?.message}>
        <Select {...unitField} onChange={onUnitChange} {...errorProps('unitSystem', errors.unitSystem?.message)}>
          {UNIT_SYSTEMS.map((system) => (
            <option key={system} value={system}>
              {system === 'imperial' ? 'Imperial (in, ft, psi, °F)' : 'Metric (mm, m, kPa, °C)'}
            </option>
          ))}
        </Select>
      </FormField>
      <Field
        form={form}
        name="minOverlapPerEnd"
        label={`Minimum overlap per end (${lengthUnit})`}
        hint="Added to each end of a defect to size its patch."
        type="number"
        step="any"
        min={0}
        valueAsNumber
      />
      <Field
        form={form}
        name="safetyMarginPercent"
        label="Working-window reserve (%)"
        hint={
          'Share of the resin’s working time held back in the go/no-go: at 20 %, the minutes from mixing until the ' +
          'patch is on the packer plus the dry run’s pull must fit in 80 % of the working time. ' +
          'Follow the resin maker’s instructions where they ask for more.'
        }
        type="number"
        step="any"
        min={0}
        max={90}
        valueAsNumber
      />
      <Field
        form={form}
        name="holdReservePercent"
        label="Hold reserve (%)"
        hint="Extra time kept inflated on top of the resin’s hold: at 10 %, a 90 min hold means deflate after 99 min. The tablet shows both."
        type="number"
        step="any"
        min={0}
        max={100}
        valueAsNumber
      />
      <Field
        form={form}
        name="linerModulus"
        label={`Liner short-term modulus (${unitSystem === 'imperial' ? 'psi' : 'MPa'})`}
        hint={
          "The initial flexural modulus of the laminate you install, from its maker's data, for the repair plan's " +
          'ASTM F1216 X1 checks. Leave empty to use the F1216 minimum (250,000 psi / 1,724 MPa).'
        }
        type="number"
        step="any"
        min={0}
        valueAsNumber
      />
      <FormActions message={message} form={form} submitLabel="Save settings" />
    </form>
  );
}
