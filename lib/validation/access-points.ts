import { z } from 'zod';
import { ACCESS_POINT_KINDS } from '@/lib/domain/vocabulary';
import { enteredToMm } from '@/lib/units/entry';
import type { UnitSystem } from '@/lib/units';
import { optionalText } from './common';

/** Depth from the rim to the invert; 30 m is far beyond any sewer access a crew would enter for a point repair. */
export const MAX_ACCESS_DEPTH_MM = 30_000;

const accessPointFields = {
  label: z.string().trim().min(1, 'Enter a label like MH-1').max(60, 'At most 60 characters'),
  kind: z.enum(ACCESS_POINT_KINDS, { error: 'Pick manhole, cleanout or other' }),
  depthMm: z
    .number({ error: 'Enter the depth as a number' })
    .int('Depth is stored in whole millimetres')
    .min(0, 'Depth cannot be negative')
    .max(MAX_ACCESS_DEPTH_MM, 'That is deeper than any access point we expect — check the unit')
    .nullish(),
  notes: optionalText(2000),
};

/** An access point (manhole, cleanout) on a site; POST /api/sites/:id/access-points. */
export const accessPointInputSchema = z.object({
  ...accessPointFields,
  kind: accessPointFields.kind.default('manhole'),
});
export type AccessPointInput = z.input<typeof accessPointInputSchema>;

export const accessPointPatchSchema = z.object(accessPointFields).partial().strict();

/** A number input of a desk form: blank (or NaN) is "not entered", anything else must read as a number. */
export const enteredNumber = z.preprocess(
  (value) =>
    value === '' || value === null || value === undefined || (typeof value === 'number' && Number.isNaN(value))
      ? undefined
      : Number(value),
  z.number({ error: 'Enter a number' }).optional(),
);

/** The desk form: depth in the company's long unit (ft or m), converted once and checked by the API's schema. */
export function accessPointFormSchema(system: UnitSystem) {
  return z
    .object({ label: z.string(), kind: z.string(), depthMm: enteredNumber })
    .transform((form): AccessPointInput => ({
      label: form.label,
      kind: form.kind as AccessPointInput['kind'],
      depthMm: enteredToMm(form.depthMm, system, 'long') ?? null,
    }))
    .pipe(accessPointInputSchema);
}
