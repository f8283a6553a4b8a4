import { z } from 'zod';
import { DEFECT_TYPES, REPAIR_STATUSES } from '@/lib/domain/vocabulary';
import { formatLength, lengthFromSi, type LengthKind, type UnitSystem } from '@/lib/units';
import { optionalText } from './common';
import { codeListSchema, optionalId } from './jobs';
import { listQuerySchema } from './list';

/** Clock position looking downstream: one hour ("3") or a span ("11-1"); the database checks the same pattern. */
export const CLOCK_POSITION = /^(1[0-2]|[1-9])(-(1[0-2]|[1-9]))?$/;
const CLOCK_MESSAGE = 'Use a clock hour like 3, or a span like 11-1';

// The longest run we expect between two access points, mm (1 km); a typo beyond it is refused.
const MAX_DISTANCE_MM = 1_000_000;
// The longest defect a point repair is planned for, mm (20 m).
const MAX_DEFECT_MM = 20_000;

/** A length the desk typed in its units and converted: stored as whole millimetres. */
const wholeMm = (what: string, min: number, max: number) =>
  z
    .number({ error: `Enter the ${what}` })
    .min(min, `The ${what} must be at least ${min} mm`)
    .max(max, `The ${what} is at most ${max} mm`)
    .transform(Math.round);

/**
 * The owner's own defect code, for owners who require a coding standard: free text kept exactly as typed (no
 * built-in list, no trimming or case change); a blank box stores nothing.
 */
function ownerDefectCode() {
  return z
    .string({ error: 'Type the owner’s code as text' })
    .max(60, 'At most 60 characters')
    .transform((value) => (value.trim() === '' ? null : value))
    .nullish();
}

// No defaults here: a PATCH must leave out what it does not change.
const repairFields = {
  jobId: z.uuid('Pick the job'),
  segmentId: z.uuid('Pick a segment'),
  distanceMm: wholeMm('distance from the access point', 0, MAX_DISTANCE_MM),
  defectType: z.enum(DEFECT_TYPES, { error: 'Pick a defect type' }),
  conditionGrade: z
    .number({ error: 'Pick a grade from 1 to 5' })
    .int('Pick a grade from 1 to 5')
    .min(1, 'Pick a grade from 1 to 5')
    .max(5, 'Pick a grade from 1 to 5'),
  defectLengthMm: wholeMm('defect length', 1, MAX_DEFECT_MM),
  clockPosition: z
    .string()
    .trim()
    .transform((value) => value || null)
    .pipe(z.string().regex(CLOCK_POSITION, CLOCK_MESSAGE).nullable())
    .nullish(),
  notes: optionalText(2000),
  ownerDefectCode: ownerDefectCode(),
};

/** What the planning panel saves (PATCH only). */
const planFields = {
  plannedPatchLengthMm: wholeMm('patch length', 1, MAX_DEFECT_MM + 10_000).nullable(),
  plannedPackerId: optionalId('Pick one of the packers'),
  plannedThicknessMm: z
    .number({ error: 'Enter the laminate thickness' })
    .positive('The laminate thickness must be above zero')
    .max(100, 'The laminate thickness is at most 100 mm')
    .nullable(),
  plannedGroundwaterHeadMm: wholeMm('groundwater head', 0, 100_000).nullable(),
  plannedOvalityPct: z
    .number({ error: 'Enter the ovality in %' })
    .min(0, 'Ovality is 0 % or more')
    .max(50, 'Ovality is at most 50 %')
    .nullable(),
};

/** POST /api/repairs. */
export const repairInputSchema = z.object(repairFields);
export type RepairInput = z.output<typeof repairInputSchema>;

/** PATCH /api/repairs/:id: the defect, the plan, and cancel/restore (installed and failed are the crew's to set). */
export const repairPatchSchema = z
  .object({
    ...repairFields,
    ...planFields,
    status: z.enum(['planned', 'cancelled'], { error: 'The office can only set a repair to planned or cancelled' }),
  })
  .omit({ jobId: true })
  .partial()
  .strict();
export type RepairPatch = z.output<typeof repairPatchSchema>;

export const REPAIR_SORT_KEYS = ['position', 'distanceMm', 'conditionGrade', 'createdAt'] as const;
export const repairListQuerySchema = listQuerySchema(REPAIR_SORT_KEYS, { sort: 'createdAt', dir: 'desc' }).and(
  z.object({
    jobId: z.uuid('Not a valid job id').optional(),
    segmentId: z.uuid('Not a valid segment id').optional(),
    status: codeListSchema(REPAIR_STATUSES, 'Unknown repair status'),
  }),
);
export type RepairListQuery = z.infer<typeof repairListQuerySchema>;

/** A number from a query string; an empty parameter is "not given", never zero. */
const queryNumber = (schema: z.ZodNumber) =>
  z.preprocess((value) => (value === '' || value === undefined ? undefined : Number(value)), schema.optional());

/**
 * GET /api/repairs/:id/plan: the what-if inputs of the planning panel, SI. Absent ones fall back to the saved plan.
 * Messages name no unit: the panel shows them to imperial and metric companies alike.
 */
export const repairPlanQuerySchema = z.object({
  groundwaterHeadMm: queryNumber(
    z
      .number({ error: 'Groundwater head must be a number' })
      .min(0, 'Groundwater head is 0 or more')
      .max(100_000, 'Groundwater head is too high for this check'),
  ),
  thicknessMm: queryNumber(
    z
      .number({ error: 'Laminate thickness must be a number' })
      .positive('Laminate thickness must be above zero')
      .max(100, 'Laminate thickness is too thick for a point repair'),
  ),
  ovalityPct: queryNumber(
    z.number({ error: 'Ovality must be a number' }).min(0, 'Ovality is 0 % or more').max(50, 'Ovality is at most 50 %'),
  ),
  patchLengthMm: queryNumber(
    z
      .number({ error: 'Patch length must be a number' })
      .positive('Patch length must be above zero')
      .max(30_000, 'Patch length is too long for a point repair'),
  ),
  longTermModulusMpa: queryNumber(
    z
      .number({ error: 'Long-term modulus must be a number' })
      .positive('Long-term modulus must be above zero')
      .max(50_000, 'Long-term modulus is at most 50 000 MPa'),
  ),
  shortTermModulusMpa: queryNumber(
    z
      .number({ error: 'Short-term modulus must be a number' })
      .positive('Short-term modulus must be above zero')
      .max(50_000, 'Short-term modulus is at most 50 000 MPa'),
  ),
  resinSystemId: z.preprocess(
    (value) => (value === '' ? undefined : value),
    z.uuid('Not a valid resin system id').optional(),
  ),
});
export type RepairPlanQuery = z.output<typeof repairPlanQuerySchema>;

/**
 * The repair form in the company's units (distance in ft or m, defect length in in or mm); the page converts
 * with lib/units and sends repairInputSchema's SI fields. The API's limits are checked here first, worded in the
 * company's units, so the form never shows the API's millimetres.
 */
export const repairFormSchema = (system: UnitSystem) => {
  const upTo = (maxMm: number, kind: LengthKind) => lengthFromSi(maxMm, system, kind);
  const text = (maxMm: number, kind: LengthKind) => formatLength(maxMm, system, kind, { decimals: 0 });
  return z.object({
    segmentId: repairFields.segmentId,
    distance: z
      .number({ error: 'Enter the distance from the access point' })
      .min(0, 'The distance cannot be negative')
      .max(upTo(MAX_DISTANCE_MM, 'long'), `The distance is at most ${text(MAX_DISTANCE_MM, 'long')}`),
    defectType: repairFields.defectType,
    conditionGrade: repairFields.conditionGrade,
    defectLength: z
      .number({ error: 'Enter the defect length' })
      .positive('The defect length must be above zero')
      .max(upTo(MAX_DEFECT_MM, 'short'), `A point repair covers a defect of at most ${text(MAX_DEFECT_MM, 'long')}`),
    clockPosition: repairFields.clockPosition,
    notes: repairFields.notes,
    ownerDefectCode: repairFields.ownerDefectCode,
  });
};

/** Where an API field's message goes on the form. */
export const REPAIR_FORM_FIELDS: Record<string, string> = { distanceMm: 'distance', defectLengthMm: 'defectLength' };
