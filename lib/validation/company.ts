import { z } from 'zod';
import { UNIT_SYSTEMS } from '@/lib/domain/vocabulary';
import { convertPressure, formatLength, lengthFromSi, lengthToSi, type UnitSystem } from '@/lib/units';

// Intl lists canonical zone names only and leaves out UTC, the column's default, so it is added here.
let zones: Set<string> | undefined;
/** The IANA time zones this runtime knows (Intl.supportedValuesOf), plus UTC. */
export function knownTimeZones(): string[] {
  zones ??= new Set(['UTC', ...Intl.supportedValuesOf('timeZone')]);
  return [...zones];
}
export const isKnownTimeZone = (zone: string) => knownTimeZones().includes(zone);

/** Working-window reserve as stored: a fraction (0.2 = inflate with 20 % of the working time left); the table allows 0–0.9. */
export const MAX_SAFETY_MARGIN = 0.9;
/** Hold reserve as stored: a fraction of the resin's hold kept on top of it (0.1 = 10 % longer); the table allows 0–1. */
export const MAX_HOLD_RESERVE = 1;
/** The liner modulus a company may set (MPa): 500–50 000 holds every cured-in-place laminate (from memory). */
export const LINER_MODULUS_MPA = { min: 500, max: 50_000 } as const;
/** An upper bound on the overlap at each end of a patch; a metre is far beyond any patch in practice. */
export const MAX_OVERLAP_MM = 1000;

const companyFields = {
  name: z.string().trim().min(1, 'Enter the company’s name').max(200, 'At most 200 characters'),
  timeZone: z.string().trim().refine(isKnownTimeZone, 'Pick a time zone from the list, e.g. America/Denver'),
  unitSystem: z.enum(UNIT_SYSTEMS, { error: 'Pick imperial or metric' }),
  minOverlapPerEndMm: z
    .number({ error: 'Enter the overlap as a number' })
    .min(0, 'The overlap cannot be negative')
    .max(MAX_OVERLAP_MM, `At most ${MAX_OVERLAP_MM} mm`)
    .transform((mm) => Math.round(mm)),
  workingWindowSafetyMargin: z
    .number({ error: 'Enter the reserve as a number' })
    .min(0, 'The reserve cannot be negative')
    .max(MAX_SAFETY_MARGIN, `At most ${MAX_SAFETY_MARGIN} (90 %)`),
  holdReserve: z
    .number({ error: 'Enter the hold reserve as a number' })
    .min(0, 'The hold reserve cannot be negative')
    .max(MAX_HOLD_RESERVE, `At most ${MAX_HOLD_RESERVE} (100 %)`),
  linerShortTermModulusMpa: z
    .number({ error: 'Enter the modulus as a number' })
    .min(LINER_MODULUS_MPA.min, `At least ${LINER_MODULUS_MPA.min} MPa`)
    .max(LINER_MODULUS_MPA.max, `At most ${LINER_MODULUS_MPA.max} MPa`)
    .nullable(),
};

/** PATCH /api/company: any of the settings, SI values (millimetres, a fraction), nothing else. */
export const companyPatchSchema = z.object(companyFields).partial().strict();
export type CompanyPatch = z.output<typeof companyPatchSchema>;

/**
 * The settings form: the overlap in the company's units and the reserve in per cent; the form converts
 * them with lib/units and sends companyPatchSchema's fields, which the server checks again.
 */
export const companyFormSchema = z
  .object({
    name: companyFields.name,
    timeZone: z.string().min(1, 'Pick a time zone'),
    unitSystem: companyFields.unitSystem,
    minOverlapPerEnd: z.number({ error: 'Enter the overlap as a number' }).min(0, 'The overlap cannot be negative'),
    safetyMarginPercent: z
      .number({ error: 'Enter the reserve as a number' })
      .min(0, 'The reserve cannot be negative')
      .max(MAX_SAFETY_MARGIN * 100, `At most ${MAX_SAFETY_MARGIN * 100} %`),
    holdReservePercent: z
      .number({ error: 'Enter the hold reserve as a number' })
      .min(0, 'The hold reserve cannot be negative')
      .max(MAX_HOLD_RESERVE * 100, `At most ${MAX_HOLD_RESERVE * 100} %`),
    /** In psi (imperial) or MPa (metric); an empty box (NaN) means the F1216 minimum. */
    linerModulus: z.union([z.number(), z.nan()], { error: 'Enter the modulus as a number' }),
  })
  // The overlap's upper bound, said in the unit system chosen in the same form (never mm to an imperial company).
  .superRefine((values, ctx) => {
    if (lengthToSi(values.minOverlapPerEnd, values.unitSystem) > MAX_OVERLAP_MM) {
      ctx.addIssue({
        code: 'custom',
        path: ['minOverlapPerEnd'],
        message: `At most ${formatLength(MAX_OVERLAP_MM, values.unitSystem, 'short', { decimals: 0 })}`,
      });
    }
    const mpa = modulusToMpa(values.linerModulus, values.unitSystem);
    if (mpa !== null && (mpa < LINER_MODULUS_MPA.min || mpa > LINER_MODULUS_MPA.max)) {
      const bound = (value: number) => modulusText(value, values.unitSystem);
      ctx.addIssue({
        code: 'custom',
        path: ['linerModulus'],
        message: `Between ${bound(LINER_MODULUS_MPA.min)} and ${bound(LINER_MODULUS_MPA.max)}`,
      });
    }
  });

// 1 psi = 6.894 757 kPa (NIST SP 811 App. B): the modulus is typed in psi by imperial companies, MPa by metric ones.
const modulusToMpa = (value: number, system: UnitSystem) =>
  Number.isFinite(value) ? round(system === 'imperial' ? convertPressure(value, 'psi', 'kPa') / 1000 : value, 1) : null;
// psi shown to the nearest 100 (a data sheet's precision), so a stored MPa value round-trips unchanged.
const modulusFromMpa = (mpa: number, system: UnitSystem) =>
  system === 'imperial' ? Math.round(convertPressure(mpa * 1000, 'kPa', 'psi') / 100) * 100 : mpa;
/** A typed modulus moved to another unit system (the form keeps the same stiffness when the units change). */
export function modulusInSystem(value: number, from: UnitSystem, to: UnitSystem): number {
  const mpa = modulusToMpa(value, from);
  return mpa === null ? value : modulusFromMpa(mpa, to);
}
const modulusText = (mpa: number, system: UnitSystem) =>
  system === 'imperial'
    ? `${modulusFromMpa(mpa, system).toLocaleString('en-US')} psi`
    : `${mpa.toLocaleString('en-US')} MPa`;
export type CompanyFormValues = z.infer<typeof companyFormSchema>;

type StoredSettings = {
  name: string;
  timeZone: string;
  unitSystem: UnitSystem;
  minOverlapPerEndMm: number;
  workingWindowSafetyMargin: number;
  holdReserve: number;
  linerShortTermModulusMpa?: number | null;
};

/** Stored settings → what the form shows: the overlap in the company's short-length unit (2 decimals), the reserve in per cent. */
export function companyToForm(company: StoredSettings): CompanyFormValues {
  return {
    name: company.name,
    timeZone: company.timeZone,
    unitSystem: company.unitSystem,
    minOverlapPerEnd: round(lengthFromSi(company.minOverlapPerEndMm, company.unitSystem), 2),
    safetyMarginPercent: round(company.workingWindowSafetyMargin * 100, 1),
    holdReservePercent: round(company.holdReserve * 100, 1),
    linerModulus:
      company.linerShortTermModulusMpa == null
        ? Number.NaN
        : modulusFromMpa(company.linerShortTermModulusMpa, company.unitSystem),
  };
}

/** The form's values → the PATCH body in SI: the overlap converted from the unit system chosen in the same form. */
export function formToCompanyPatch(values: CompanyFormValues) {
  return {
    name: values.name,
    timeZone: values.timeZone,
    unitSystem: values.unitSystem,
    minOverlapPerEndMm: Math.round(lengthToSi(values.minOverlapPerEnd, values.unitSystem)),
    workingWindowSafetyMargin: round(values.safetyMarginPercent / 100, 3),
    holdReserve: round(values.holdReservePercent / 100, 3),
    linerShortTermModulusMpa: modulusToMpa(values.linerModulus, values.unitSystem),
  };
}

const round = (value: number, decimals: number) => Math.round(value * 10 ** decimals) / 10 ** decimals;
