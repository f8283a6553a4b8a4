import { z } from 'zod';
import {
  formatLength,
  formatPressure,
  lengthFromSi,
  lengthToSi,
  pressureFromSi,
  pressureToSi,
  type UnitSystem,
} from '@/lib/units';
import { optionalText } from './common';
import { listQuerySchema } from './list';
import { addProblems, ifFinite, inCompanyUnits, quantity, roundTo, type Problems } from './rules';

// Project limits: point-repair packers serve pipes up to about 1.5 m; 3 m and 10 m bladders and 2000 kPa
// (290 psi) are beyond any of them, so a larger figure is a typo or a wrong unit.
// The limits are SI; their messages are worded in the units of whoever reads them (the API: SI; a form: the company's).
const packerFieldsIn = (system: UnitSystem) => {
  const length = (mm: number) => formatLength(mm, system, 'short', { decimals: system === 'imperial' ? 2 : 0 });
  const mm = (min: number, max: number) =>
    quantity({ min, max, scale: 0, bounds: `From ${length(min)} to ${length(max)}` });
  const kpa = () =>
    quantity({
      min: 0,
      max: 2000,
      scale: 1,
      bounds: `From ${formatPressure(0, system, { decimals: 0 })} to ${formatPressure(2000, system, { decimals: 0 })}`,
    });
  return {
    name: z.string().trim().min(1, 'Enter the packer’s name').max(120, 'At most 120 characters'),
    serial: optionalText(60),
    minDiameterMm: mm(1, 3000),
    maxDiameterMm: mm(1, 3000),
    bladderLengthMm: mm(1, 10000),
    endMarginMm: mm(0, 5000),
    minPressureKpa: kpa(),
    maxPressureKpa: kpa(),
  };
};

// No defaults here: a PATCH must leave out what it does not change.
const packerObject = z.object(packerFieldsIn('metric'));

/** What the cross-field rules read: the packer's sizes and pressures, as the schema gives them. */
export type PackerValues = Omit<z.output<typeof packerObject>, 'name' | 'serial'>;

export function packerProblems(v: PackerValues): Problems {
  const problems: Problems = {};
  if (v.minDiameterMm >= v.maxDiameterMm) problems.maxDiameterMm = 'The largest pipe must be larger than the smallest';
  // With a margin of half the bladder at each end no patch is left to press (lib/sizing fittingPackers).
  if (2 * v.endMarginMm >= v.bladderLengthMm)
    problems.endMarginMm = 'Twice the end margin must be shorter than the bladder, or no patch fits';
  if (v.minPressureKpa >= v.maxPressureKpa) problems.maxPressureKpa = 'The maximum pressure must be above the minimum';
  return problems;
}

/** A packer in SI; POST /api/packers and the form (after conversion) use it. */
const packerSchemaIn = (system: UnitSystem) =>
  z.object(packerFieldsIn(system)).superRefine((values, ctx) => addProblems(ctx, packerProblems(values)));
export const packerInputSchema = packerSchemaIn('metric');
export type PackerInput = z.output<typeof packerInputSchema>;

export const packerPatchSchema = packerObject.partial().strict();

export const PACKER_SORT_KEYS = ['name', 'minDiameterMm', 'maxDiameterMm', 'bladderLengthMm', 'createdAt'] as const;
export const packerListQuerySchema = listQuerySchema(PACKER_SORT_KEYS, { sort: 'minDiameterMm' });
export type PackerListQuery = z.infer<typeof packerListQuerySchema>;

// ——— The desk form: inches and psi (imperial) or mm and kPa ———

export type PackerFormValues = PackerValues & { name: string; serial?: string | null };

export const packerFormSchema = (system: UnitSystem) =>
  inCompanyUnits<PackerInput, PackerFormValues>((v) => packerToSi(v, system), packerSchemaIn(system));

/** Entered values → SI body: whole millimetres and tenths of a kPa, as the columns keep them. */
function packerToSi(v: PackerFormValues, system: UnitSystem) {
  const length = ifFinite((value) => roundTo(lengthToSi(value, system, 'short'), 0));
  const pressure = ifFinite((value) => roundTo(pressureToSi(value, system), 1));
  return {
    ...v,
    minDiameterMm: length(v.minDiameterMm),
    maxDiameterMm: length(v.maxDiameterMm),
    bladderLengthMm: length(v.bladderLengthMm),
    endMarginMm: length(v.endMarginMm),
    minPressureKpa: pressure(v.minPressureKpa),
    maxPressureKpa: pressure(v.maxPressureKpa),
  };
}

/** A stored packer → the form's values (hundredths of an inch or psi; SI as stored). */
export function packerToForm(row: PackerFormValues, system: UnitSystem): PackerFormValues {
  const length = (value: number) => roundTo(lengthFromSi(value, system, 'short'), 2);
  const pressure = (value: number) => roundTo(pressureFromSi(value, system), 2);
  return {
    name: row.name,
    serial: row.serial ?? '',
    minDiameterMm: length(row.minDiameterMm),
    maxDiameterMm: length(row.maxDiameterMm),
    bladderLengthMm: length(row.bladderLengthMm),
    endMarginMm: length(row.endMarginMm),
    minPressureKpa: pressure(row.minPressureKpa),
    maxPressureKpa: pressure(row.maxPressureKpa),
  };
}
