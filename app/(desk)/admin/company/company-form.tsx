'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { FormField, errorProps } from '@/components/desk/form-field';
import { Input, Select } from '@/components/ui/input';
import { Button } from '@/components/ui/button';
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
  const [message, setMessage] = useState<{ ok: boolean; text: string }>();
  const {
    register,
    control,
    handleSubmit,
    setError,
    setValue,
    getValues,
    formState: { errors, isSubmitting },
  } = useForm<CompanyFormValues>({
    resolver: zodResolver(companyFormSchema),
    defaultValues: initial,
  });
  const unitSystem = useWatch({ control, name: 'unitSystem' });
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

  const onSubmit = handleSubmit(async (values) => {
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
      <FormField id="name" label="Company name" error={errors.name?.message}>
        <Input {...register('name')} {...errorProps('name', errors.name?.message)} />
      </FormField>
      <FormField
        id="timeZone"
        label="Time zone"
        error={errors.timeZone?.message}
        hint="Times are stored in UTC and shown in this zone."
      >
        <Select {...register('timeZone')} {...errorProps('timeZone', errors.timeZone?.message)}>
          {timeZones.map((zone) => (
            <option key={zone} value={zone}>
              {zone}
            </option>
          ))}
        </Select>
      </FormField>
      <FormField id="unitSystem" label="Units" error={errors.unitSystem?.message}>
        <Select {...unitField} onChange={onUnitChange} {...errorProps('unitSystem', errors.unitSystem?.message)}>
          {UNIT_SYSTEMS.map((system) => (
            <option key={system} value={system}>
              {system === 'imperial' ? 'Imperial (in, ft, psi, °F)' : 'Metric (mm, m, kPa, °C)'}
            </option>
          ))}
        </Select>
      </FormField>
      <FormField
        id="minOverlapPerEnd"
        label={`Minimum overlap per end (${lengthUnit})`}
        error={errors.minOverlapPerEnd?.message}
        hint="Added to each end of a defect to size its patch."
      >
        <Input
          type="number"
          step="any"
          min={0}
          {...register('minOverlapPerEnd', { valueAsNumber: true })}
          {...errorProps('minOverlapPerEnd', errors.minOverlapPerEnd?.message)}
        />
      </FormField>
      <FormField
        id="safetyMarginPercent"
        label="Working-window reserve (%)"
        error={errors.safetyMarginPercent?.message}
        hint={
          'Share of the resin’s working time held back in the go/no-go: at 20 %, the minutes from mixing until the ' +
          'patch is on the packer plus the dry run’s pull must fit in 80 % of the working time. ' +
          'Follow the resin maker’s instructions where they ask for more.'
        }
      >
        <Input
          type="number"
          step="any"
          min={0}
          max={90}
          {...register('safetyMarginPercent', { valueAsNumber: true })}
          {...errorProps('safetyMarginPercent', errors.safetyMarginPercent?.message)}
        />
      </FormField>
      <FormField
        id="holdReservePercent"
        label="Hold reserve (%)"
        error={errors.holdReservePercent?.message}
        hint="Extra time kept inflated on top of the resin’s hold: at 10 %, a 90 min hold means deflate after 99 min. The tablet shows both."
      >
        <Input
          type="number"
          step="any"
          min={0}
          max={100}
          {...register('holdReservePercent', { valueAsNumber: true })}
          {...errorProps('holdReservePercent', errors.holdReservePercent?.message)}
        />
      </FormField>
      <FormField
        id="linerModulus"
        label={`Liner short-term modulus (${unitSystem === 'imperial' ? 'psi' : 'MPa'})`}
        error={errors.linerModulus?.message}
        hint={
          "The initial flexural modulus of the laminate you install, from its maker's data, for the repair plan's " +
          'ASTM F1216 X1 checks. Leave empty to use the F1216 minimum (250,000 psi / 1,724 MPa).'
        }
      >
        <Input
          type="number"
          step="any"
          min={0}
          {...register('linerModulus', { valueAsNumber: true })}
          {...errorProps('linerModulus', errors.linerModulus?.message)}
        />
      </FormField>
      {message && (
        <p
          role={message.ok ? 'status' : 'alert'}
          className={cn('text-sm font-medium md:col-span-2', message.ok ? 'text-safe-700' : 'text-missed-700')}
        >
          {message.text}
        </p>
      )}
      <div className="md:col-span-2">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? 'Saving…' : 'Save settings'}
        </Button>
      </div>
    </form>
  );
}
