import { z } from 'zod';
import { volumeFromSi, volumeToSi, type UnitSystem } from '@/lib/units';
import { isoDateSchema, optionalText, uuidSchema } from './common';
import { listQuerySchema } from './list';
import { addProblems, ifFinite, inCompanyUnits, quantity, roundTo, type Problems } from './rules';

const optionalDate = z.preprocess((value) => (value === '' ? null : value), isoDateSchema.nullish());

// No defaults here: a PATCH must leave out what it does not change.
const resinKitFields = {
  resinSystemId: z.uuid('Choose a resin system'),
  lot: z.string().trim().min(1, 'Enter the lot number printed on the kit').max(60, 'At most 60 characters'),
  expiresOn: isoDateSchema,
  // Project limit: 99 999 L is far beyond any store of kits, and fits the NUMERIC(8, 2) column.
  quantityL: quantity({ min: 0, max: 99999, scale: 2, bounds: 'From 0 to 99 999 litres' }),
  receivedOn: optionalDate,
  notes: optionalText(2000),
};

export function resinKitProblems(v: { expiresOn: string; receivedOn?: string | null }): Problems {
  // ISO dates compare as text.
  return v.receivedOn && v.receivedOn > v.expiresOn
    ? { receivedOn: 'Received after it expired? Check both dates' }
    : {};
}

/** A resin kit (lot) in SI; POST /api/resin-kits and the form (after conversion) use it. */
export const resinKitInputSchema = z
  .object(resinKitFields)
  .superRefine((values, ctx) => addProblems(ctx, resinKitProblems(values)));
export type ResinKitInput = z.output<typeof resinKitInputSchema>;

export const resinKitPatchSchema = z.object(resinKitFields).partial().strict();

export const RESIN_KIT_SORT_KEYS = ['expiresOn', 'lot', 'quantityL', 'createdAt'] as const;
export const resinKitListQuerySchema = listQuerySchema(RESIN_KIT_SORT_KEYS, { sort: 'expiresOn' }).and(
  z.object({
    resinSystemId: uuidSchema.optional(),
    expired: z.enum(['true', 'false'], { error: 'expired is true or false' }).optional(),
  }),
);
export type ResinKitListQuery = z.infer<typeof resinKitListQuerySchema>;

// ——— The desk form: quantity in US gallons (imperial) or litres ———

export type ResinKitFormValues = {
  resinSystemId: string;
  lot: string;
  expiresOn: string;
  quantityL: number;
  receivedOn?: string | null;
  notes?: string | null;
};

export const resinKitFormSchema = (system: UnitSystem) =>
  inCompanyUnits<ResinKitInput, ResinKitFormValues>(
    (v) => ({ ...v, quantityL: ifFinite((value) => roundTo(volumeToSi(value, system), 2))(v.quantityL) }),
    resinKitInputSchema,
  );

export function resinKitToForm(row: ResinKitFormValues, system: UnitSystem): ResinKitFormValues {
  return {
    ...row,
    quantityL: roundTo(volumeFromSi(row.quantityL, system), 2),
    receivedOn: row.receivedOn ?? '',
    notes: row.notes ?? '',
  };
}
