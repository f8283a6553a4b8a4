'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useLocale, useTranslations } from 'next-intl';
import { useEffect, useMemo } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { z } from 'zod';
import { useLibMessage } from '@/i18n/use-lib-message';
import type { LibMessage } from '@/lib/i18n/message';
import { formatDay } from '@/lib/time/dates-locale';
import {
  formatLength,
  formatTemperature,
  lengthFromSi,
  lengthToSi,
  temperatureToSi,
  unitLabels,
  type UnitSystem,
} from '@/lib/units';
import { eventPayloadSchemas } from '@/lib/validation/install-events';
import { FieldInput, PrimaryAction, StepCard } from './field-ui';
import { KitScan } from './kit-scan';

export type KitOption = {
  id: string;
  lot: string;
  expiresOn: string;
  expired: boolean;
  resinName: string;
  prepMinutes: number | null;
};
export type PackerOption = {
  id: string;
  name: string;
  fits: boolean;
  reasons: string[];
  reasonDetails?: LibMessage[];
};
export type Conditions = z.infer<(typeof eventPayloadSchemas)['conditions_recorded']>;

type Messages = (
  key:
    'errMixTemp' | 'errAirTemp' | 'errPrep' | 'errNotBelowZero' | 'errPipeTemp' | 'errKit' | 'errPacker' | 'errPatch',
) => string;

// Entered in the company's units; converted to SI once, then checked against the event's own schema.
const formSchemaOf = (t: Messages) =>
  z.object({
    mixTemp: z.coerce.number({ error: t('errMixTemp') }),
    airTemp: z.coerce.number({ error: t('errAirTemp') }),
    prepMinutes: z.coerce.number({ error: t('errPrep') }).min(0, t('errNotBelowZero')),
    pipeTemp: z.coerce.number({ error: t('errPipeTemp') }),
    resinKitId: z.uuid(t('errKit')),
    packerId: z.uuid(t('errPacker')),
    patchLength: z.coerce.number({ error: t('errPatch') }).positive(t('errPatch')),
  });
type FormInput = z.input<ReturnType<typeof formSchemaOf>>;
type FormValues = z.output<ReturnType<typeof formSchemaOf>>;

/** Conditions and materials: temperatures, resin kit by lot (expired ones refused), packer that fits, patch length. */
export function StepConditions({
  unitSystem,
  kits,
  packers,
  plannedPatchLengthMm,
  initial,
  onSave,
}: {
  unitSystem: UnitSystem;
  kits: KitOption[];
  packers: PackerOption[];
  plannedPatchLengthMm: number | null;
  initial:
    (Omit<Conditions, 'airTempC' | 'prepMinutes'> & { airTempC?: number | null; prepMinutes?: number | null }) | null;
  onSave: (conditions: Conditions) => void;
}) {
  const t = useTranslations('install.conditions');
  const locale = useLocale();
  const say = useLibMessage(unitSystem);
  const formSchema = useMemo(() => formSchemaOf(t), [t]);
  const units = unitLabels(unitSystem);
  const { register, handleSubmit, setError, setValue, getFieldState, control, formState } = useForm<
    FormInput,
    unknown,
    FormValues
  >({
    resolver: zodResolver(formSchema),
    defaultValues: {
      prepMinutes: initial?.prepMinutes ?? undefined,
      resinKitId: initial?.resinKitId ?? '',
      packerId: initial?.packerId ?? packers.find((p) => p.fits)?.id ?? '',
      patchLength: plannedPatchLengthMm
        ? Number(lengthFromSi(initial?.patchLengthMm ?? plannedPatchLengthMm, unitSystem).toFixed(1))
        : undefined,
    },
  });
  const { errors } = formState;
  // The resin system's wet-out and loading minutes fill the box until the crew types its own.
  const kitId = useWatch({ control, name: 'resinKitId' });
  const kitPrep = kits.find((k) => k.id === kitId)?.prepMinutes;
  useEffect(() => {
    if (kitPrep != null && !getFieldState('prepMinutes').isDirty && initial?.prepMinutes == null)
      setValue('prepMinutes', kitPrep);
  }, [kitPrep, getFieldState, setValue, initial]);

  const submit = handleSubmit((values) => {
    const kit = kits.find((k) => k.id === values.resinKitId);
    if (kit?.expired) {
      setError('resinKitId', { message: t('errKitExpired', { lot: kit.lot, date: formatDay(kit.expiresOn, locale) }) });
      return;
    }
    const conditions = {
      mixTempC: round(temperatureToSi(values.mixTemp, unitSystem), 1),
      airTempC: round(temperatureToSi(values.airTemp, unitSystem), 1),
      prepMinutes: round(values.prepMinutes, 1),
      pipeTempC: round(temperatureToSi(values.pipeTemp, unitSystem), 1),
      resinKitId: values.resinKitId,
      packerId: values.packerId,
      patchLengthMm: Math.round(lengthToSi(values.patchLength, unitSystem)),
    };
    const checked = eventPayloadSchemas.conditions_recorded.safeParse(conditions);
    if (!checked.success) {
      for (const issue of checked.error.issues) {
        const field =
          (
            {
              mixTempC: 'mixTemp',
              airTempC: 'airTemp',
              prepMinutes: 'prepMinutes',
              pipeTempC: 'pipeTemp',
              patchLengthMm: 'patchLength',
            } as const
          )[issue.path[0] as 'mixTempC'] ?? 'mixTemp';
        setError(field, { message: t('errOutOfRange', { message: rangeText(issue) }) });
      }
      return;
    }
    onSave(checked.data);
  });

  /**
   * The SI schema's limit in the reader's words and the company's units; English keeps the schema's own
   * message ("below −20 °C"), which the server answers with too.
   */
  function rangeText(issue: z.core.$ZodIssue): string {
    if (locale === 'en') return issue.message;
    const field = String(issue.path[0]);
    const limit = Number(issue.code === 'too_small' ? issue.minimum : issue.code === 'too_big' ? issue.maximum : NaN);
    if (!Number.isFinite(limit)) return t('range.check');
    const side = issue.code === 'too_small' ? 'below' : 'above';
    if (field.endsWith('TempC')) return t(`range.${side}`, { limit: formatTemperature(limit, unitSystem, { locale }) });
    if (field === 'prepMinutes') return t(`range.${side}`, { limit: `${limit} min` });
    if (field === 'patchLengthMm')
      return t(`range.${side}`, { limit: formatLength(limit, unitSystem, 'short', { locale, decimals: 0 }) });
    return t('range.check');
  }

  return (
    <StepCard title={t('title')} testId="step-conditions">
      <form onSubmit={submit} noValidate className="space-y-4">
        <div className="grid gap-4 sm:grid-cols-2">
          <FieldInput
            id="mixTemp"
            label={t('mixTemp', { unit: units.temperature })}
            inputMode="decimal"
            error={errors.mixTemp?.message}
            {...register('mixTemp')}
          />
          <FieldInput
            id="airTemp"
            label={t('airTemp', { unit: units.temperature })}
            inputMode="decimal"
            error={errors.airTemp?.message}
            {...register('airTemp')}
          />
          <FieldInput
            id="pipeTemp"
            label={t('pipeTemp', { unit: units.temperature })}
            inputMode="decimal"
            error={errors.pipeTemp?.message}
            {...register('pipeTemp')}
          />
        </div>
        <p className="text-base text-slate-600">{t('warmer')}</p>
        <div>
          <label htmlFor="resinKitId" className="block text-lg font-semibold">
            {t('kit')}
          </label>
          <KitScan
            kits={kits}
            onPick={(id) => setValue('resinKitId', id, { shouldDirty: true, shouldValidate: true })}
          />
          <select
            id="resinKitId"
            className="mt-1 block min-h-touch w-full rounded-md border-2 border-slate-400 px-3 text-xl"
            aria-describedby={errors.resinKitId ? 'resinKitId-error' : undefined}
            {...register('resinKitId')}
          >
            <option value="">{t('choose')}</option>
            {kits.map((kit) => (
              <option key={kit.id} value={kit.id}>
                {kit.lot} · {kit.resinName} ·{' '}
                {kit.expired
                  ? t('kitExpired', { date: formatDay(kit.expiresOn, locale) })
                  : t('kitUseBy', { date: formatDay(kit.expiresOn, locale) })}
              </option>
            ))}
          </select>
          {errors.resinKitId && (
            <p id="resinKitId-error" role="alert" className="mt-1 text-base font-medium text-missed-700">
              {errors.resinKitId.message}
            </p>
          )}
        </div>
        <div>
          <label htmlFor="packerId" className="block text-lg font-semibold">
            {t('packer')}
          </label>
          <select
            id="packerId"
            className="mt-1 block min-h-touch w-full rounded-md border-2 border-slate-400 px-3 text-xl"
            {...register('packerId')}
          >
            <option value="">{t('choose')}</option>
            {packers.map((packer) => (
              <option key={packer.id} value={packer.id}>
                {packer.name}
                {packer.fits
                  ? t('fits')
                  : t('doesNotFit', {
                      reasons: packer.reasonDetails?.map((r) => say(r)).join('; ') ?? packer.reasons.join('; '),
                    })}
              </option>
            ))}
          </select>
          {errors.packerId && <p className="mt-1 text-base font-medium text-missed-700">{errors.packerId.message}</p>}
        </div>
        <FieldInput
          id="prepMinutes"
          label={t('prep')}
          hint={t('prepHint')}
          inputMode="decimal"
          error={errors.prepMinutes?.message}
          {...register('prepMinutes')}
        />
        <FieldInput
          id="patchLength"
          label={t('patchLength', { unit: units.shortLength })}
          inputMode="decimal"
          error={errors.patchLength?.message}
          {...register('patchLength')}
        />
        <PrimaryAction onClick={() => void submit()}>{t('save')}</PrimaryAction>
      </form>
    </StepCard>
  );
}

const round = (value: number, decimals: number) => Math.round(value * 10 ** decimals) / 10 ** decimals;
