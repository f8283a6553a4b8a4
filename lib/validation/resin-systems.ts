import { z } from 'zod';
import { MAX_TEMP_C, MIN_TEMP_C } from '@/lib/cure';
import { RESIN_CHEMISTRIES, SENSITIVITY_KINDS } from '@/lib/domain/vocabulary';
import { DEFAULT_EXCESS_PCT, DEFAULT_RESIN_TO_FABRIC_RATIO } from '@/lib/sizing';
import {
  formatTemperature,
  temperatureDifferenceFromSi,
  temperatureDifferenceToSi,
  temperatureFromSi,
  temperatureToSi,
  type UnitSystem,
} from '@/lib/units';
import { listQuerySchema } from './list';
import { addProblems, ifFinite, inCompanyUnits, quantity, roundTo, type Problems } from './rules';

// Project limits. Temperatures: the range the cure clock models (lib/cure/limits.ts), −20…60 °C = −4…140 °F.
// Times: a day of pot life, a week of hold, a month of full cure — past that it is a typo (minutes for hours).
// Sensitivity: a doubling step of 1–50 °C, an activation energy of 1–300 kJ/mol (epoxies sit near 40–90, from memory).
// Messages name the bounds in one unit system: the API's SI body reads °C; the desk form, the company's units.
const temperature = (system: UnitSystem) =>
  quantity({
    min: MIN_TEMP_C,
    max: MAX_TEMP_C,
    scale: 2,
    bounds: `Between ${formatTemperature(MIN_TEMP_C, system, { decimals: 0 })} and ${formatTemperature(MAX_TEMP_C, system, { decimals: 0 })}`,
  });
const doublingStep = (system: UnitSystem) => {
  const step = (celsius: number) =>
    `${roundTo(temperatureDifferenceFromSi(celsius, system), 1)} ${system === 'imperial' ? '°F' : '°C'}`;
  return quantity({ min: 1, max: 50, scale: 2, bounds: `A step of ${step(1)} to ${step(50)}` });
};
const minutes = (max: number) =>
  quantity({ min: 0, max, scale: 2, above: true, bounds: `More than 0 and at most ${max} minutes` });

// No defaults here: a PATCH must leave out what it does not change.
const fieldsIn = (system: UnitSystem) => ({
  name: z.string().trim().min(1, 'Enter the resin system’s name').max(120, 'At most 120 characters'),
  chemistry: z.enum(RESIN_CHEMISTRIES, { error: 'Pick a chemistry' }),
  refTempC: temperature(system),
  potLifeMin: minutes(1440),
  holdMin: minutes(10080),
  fullCureMin: minutes(43200),
  minTempC: temperature(system),
  maxTempC: temperature(system),
  sensitivityKind: z.enum(SENSITIVITY_KINDS, { error: 'Pick how the times change with temperature' }),
  doublingC: doublingStep(system).nullish(),
  activationEnergyKj: quantity({ min: 1, max: 300, scale: 2, bounds: 'Between 1 and 300 kJ/mol' }).nullish(),
  // Resin quantity (lib/sizing): unit-free, so the same words serve every company.
  resinToFabricRatio: quantity({
    min: 0,
    max: 5,
    scale: 2,
    above: true,
    bounds: 'More than 0 and at most 5 (1 = as much resin as fabric)',
  }),
  resinExcessPct: quantity({ min: 0, max: 100, scale: 1, bounds: 'From 0 to 100 %' }),
  // Minutes from mixing until the patch is on the packer (wet-out and loading); the tablet's default for the GO / NO-GO.
  prepMinutes: quantity({ min: 0, max: 240, scale: 2, bounds: 'From 0 to 240 minutes' }),
});
const resinSystemObject = z.object(fieldsIn('metric'));
type ResinSystemFields = z.output<typeof resinSystemObject>;
/** The data sheet's times and temperature range. */
type DataSheetTimes = Pick<
  ResinSystemFields,
  'refTempC' | 'potLifeMin' | 'holdMin' | 'fullCureMin' | 'minTempC' | 'maxTempC'
>;

/** What the cross-field rules read: the data sheet's numbers, as the schema gives them. */
export type ResinSystemValues = DataSheetTimes &
  Pick<ResinSystemFields, 'sensitivityKind' | 'doublingC' | 'activationEnergyKj'>;

/** What a careful hand checks on a data sheet before trusting the clock with it. */
export function resinSystemProblems(v: ResinSystemValues): Problems {
  const problems: Problems = {};
  if (v.minTempC >= v.maxTempC) problems.maxTempC = 'The maximum temperature must be above the minimum';
  else if (v.refTempC < v.minTempC || v.refTempC > v.maxTempC)
    problems.refTempC = 'The reference temperature must lie between the minimum and the maximum';
  if (v.potLifeMin >= v.holdMin) problems.holdMin = 'The hold must be longer than the pot life';
  if (v.holdMin > v.fullCureMin) problems.fullCureMin = 'Full cure cannot be shorter than the hold';
  if (v.sensitivityKind === 'doubling' && !v.doublingC) problems.doublingC = 'Enter the step that halves the times';
  if (v.sensitivityKind === 'arrhenius' && !v.activationEnergyKj)
    problems.activationEnergyKj = 'Enter the activation energy';
  return problems;
}

/** A resin system as the admin enters it, in SI; messages in the given system (the form's), °C for the API. */
const inputSchemaIn = (system: UnitSystem) => {
  const fields = fieldsIn(system);
  return z
    .object({
      ...fields,
      chemistry: fields.chemistry.default('epoxy'),
      sensitivityKind: fields.sensitivityKind.default('doubling'),
      resinToFabricRatio: fields.resinToFabricRatio.default(DEFAULT_RESIN_TO_FABRIC_RATIO),
      resinExcessPct: fields.resinExcessPct.default(DEFAULT_EXCESS_PCT),
      prepMinutes: fields.prepMinutes.optional(),
    })
    .superRefine((values, ctx) => addProblems(ctx, resinSystemProblems(values)));
};
/** POST /api/resin-systems (SI) and, after conversion, the desk form. */
export const resinSystemInputSchema = inputSchemaIn('metric');
export type ResinSystemInput = z.output<typeof resinSystemInputSchema>;

/** Partial; the cross-field rules run in lib/data on the record as it will be after the change. */
export const resinSystemPatchSchema = resinSystemObject.partial().strict();

export const RESIN_SYSTEM_SORT_KEYS = ['name', 'chemistry', 'refTempC', 'potLifeMin', 'createdAt'] as const;
export const resinSystemListQuerySchema = listQuerySchema(RESIN_SYSTEM_SORT_KEYS, { sort: 'name' }).and(
  z.object({ chemistry: z.enum(RESIN_CHEMISTRIES, { error: 'Unknown chemistry' }).optional() }),
);
export type ResinSystemListQuery = z.infer<typeof resinSystemListQuerySchema>;

// ——— The desk form: the same fields in the company's units (°F and °F steps for imperial) ———

/** What the form holds: numbers in the company's units (NaN while a box is empty). */
export type ResinSystemFormValues = DataSheetTimes & {
  name: string;
  chemistry: string;
  sensitivityKind: string;
  doublingC: number | null;
  activationEnergyKj: number | null;
  resinToFabricRatio?: number;
  resinExcessPct?: number;
  prepMinutes?: number;
};

export const resinSystemFormSchema = (system: UnitSystem) =>
  inCompanyUnits<ResinSystemInput, ResinSystemFormValues>((v) => resinSystemToSi(v, system), inputSchemaIn(system));

/** Entered values → SI body. Absolute temperatures take the 32 °F offset; the doubling step is a difference and does not. */
function resinSystemToSi(v: ResinSystemFormValues, system: UnitSystem) {
  const abs = ifFinite((value) => roundTo(temperatureToSi(value, system), 2));
  const step = ifFinite((value) => roundTo(temperatureDifferenceToSi(value, system), 2));
  return {
    ...v,
    refTempC: abs(v.refTempC),
    minTempC: abs(v.minTempC),
    maxTempC: abs(v.maxTempC),
    doublingC: noneIfEmpty(step(v.doublingC)),
    activationEnergyKj: noneIfEmpty(v.activationEnergyKj),
    resinToFabricRatio: defaultIfEmpty(v.resinToFabricRatio),
    resinExcessPct: defaultIfEmpty(v.resinExcessPct),
  };
}

/** A stored resin system → the form's values in the company's units (one decimal of a degree). */
export function resinSystemToForm(
  row: ResinSystemValues & {
    name: string;
    chemistry: string;
    resinToFabricRatio?: number;
    resinExcessPct?: number;
    prepMinutes?: number;
  },
  system: UnitSystem,
): ResinSystemFormValues {
  const abs = (celsius: number) => roundTo(temperatureFromSi(celsius, system), 1);
  return {
    name: row.name,
    chemistry: row.chemistry,
    refTempC: abs(row.refTempC),
    potLifeMin: row.potLifeMin,
    holdMin: row.holdMin,
    fullCureMin: row.fullCureMin,
    minTempC: abs(row.minTempC),
    maxTempC: abs(row.maxTempC),
    sensitivityKind: row.sensitivityKind,
    doublingC: row.doublingC == null ? null : roundTo(temperatureDifferenceFromSi(row.doublingC, system), 1),
    activationEnergyKj: row.activationEnergyKj ?? null,
    resinToFabricRatio: row.resinToFabricRatio ?? DEFAULT_RESIN_TO_FABRIC_RATIO,
    resinExcessPct: row.resinExcessPct ?? DEFAULT_EXCESS_PCT,
    prepMinutes: row.prepMinutes,
  };
}

// An optional box left empty is "none", not a wrong number.
const noneIfEmpty = (value: unknown) =>
  (typeof value === 'number' && Number.isNaN(value)) || value === undefined ? null : value;
// An empty resin-quantity box takes the schema's default (a PATCH leaves the stored value alone).
const defaultIfEmpty = (value: unknown) =>
  (typeof value === 'number' && Number.isNaN(value)) || value === null ? undefined : value;
