import { z } from 'zod';
import { PIPE_MATERIALS } from '@/lib/domain/vocabulary';
import { enteredToMm } from '@/lib/units/entry';
import type { UnitSystem } from '@/lib/units';
import { uuidSchema } from './common';
import { listQuerySchema } from './list';
import { MAX_ACCESS_DEPTH_MM, enteredNumber as entered } from './access-points';

/*
 * Nominal size is a trade designation, not a measurement, so the measured inside diameter may sit
 * either side of it. Above: ductile-iron and some older clay pipe run a few per cent over nominal
 * (a 4–12 in ductile-iron pipe measures roughly 5–8 % over, from memory), so we allow 15 % over.
 * Below: metric plastic pipe is named by its outside diameter (a 160 mm PE pipe is ~130–147 mm
 * inside), and scale, deformation or an old lining take more; we allow down to half. Anything
 * outside that band is almost always a unit slip (inches typed as millimetres), which is what the
 * check is for. Common practice, not from a standard.
 */
export const ID_OVER_NOMINAL_MAX = 1.15;
export const ID_UNDER_NOMINAL_MIN = 0.5;

const segmentFields = {
  label: z.string().trim().min(1, 'Enter a label like MH-1 → MH-2').max(60, 'At most 60 characters'),
  fromAccessPointId: z.uuid('Pick the access point the segment starts at'),
  // Null when the far end has no access point of its own (e.g. a lateral running into the main).
  toAccessPointId: z.uuid('Pick the access point at the far end').nullish(),
  material: z.enum(PIPE_MATERIALS, { error: 'Pick the pipe material' }),
  nominalSizeMm: z
    .number({ error: 'Enter the nominal size' })
    .int('Nominal size is stored in whole millimetres')
    .min(25, 'Nominal size is too small for a sewer or drain — check the unit')
    .max(3000, 'Nominal size is too large — check the unit'),
  insideDiameterMm: z
    .number({ error: 'Enter the measured inside diameter' })
    .positive('Inside diameter must be more than zero')
    .max(3500, 'Inside diameter is too large — check the unit')
    .transform((mm) => Math.round(mm * 10) / 10),
  lengthMm: z
    .number({ error: 'Enter the length between the access points' })
    .int('Length is stored in whole millimetres')
    .positive('Length must be more than zero')
    .max(1_000_000, 'Longer than 1 km between access points — check the unit'),
  depthMm: z
    .number({ error: 'Enter the depth as a number' })
    .int('Depth is stored in whole millimetres')
    .min(0, 'Depth cannot be negative')
    .max(MAX_ACCESS_DEPTH_MM, 'Deeper than we expect — check the unit')
    .nullish(),
};

type Shape = {
  fromAccessPointId: string;
  toAccessPointId?: string | null;
  nominalSizeMm: number;
  insideDiameterMm: number;
};

/** Rules that need several fields of a whole segment, as field messages (empty when it is sound). */
export function segmentShapeIssues(segment: Shape): Record<string, string[]> {
  const issues: Record<string, string[]> = {};
  if (segment.toAccessPointId && segment.toAccessPointId === segment.fromAccessPointId) {
    issues.toAccessPointId = ['The two ends must be different access points'];
  }
  const ratio = segment.insideDiameterMm / segment.nominalSizeMm;
  if (ratio > ID_OVER_NOMINAL_MAX)
    issues.insideDiameterMm = ['Inside diameter is well over the nominal size — check both and their units'];
  if (ratio < ID_UNDER_NOMINAL_MIN)
    issues.insideDiameterMm = ['Inside diameter is under half the nominal size — check both and their units'];
  return issues;
}

/** A segment as POST /api/segments takes it (SI); the desk form reaches it through segmentFormSchema. */
export const segmentInputSchema = z
  .object({ siteId: z.uuid('Pick the site'), ...segmentFields })
  .superRefine((segment, ctx) => {
    for (const [field, messages] of Object.entries(segmentShapeIssues(segment))) {
      for (const message of messages) ctx.addIssue({ code: 'custom', path: [field], message });
    }
  });
export type SegmentInput = z.input<typeof segmentInputSchema>;

/** PATCH: the site is fixed; the merged segment is checked against segmentShapeIssues in the data layer. */
export const segmentPatchSchema = z.object(segmentFields).partial().strict();

export const SEGMENT_SORT_KEYS = ['label', 'insideDiameterMm', 'lengthMm', 'createdAt'] as const;
export const segmentListQuerySchema = listQuerySchema(SEGMENT_SORT_KEYS, { sort: 'label' }).and(
  z.object({ siteId: uuidSchema.optional() }),
);
export type SegmentListQuery = z.infer<typeof segmentListQuerySchema>;

/**
 * The desk form: sizes in the company's short unit (in or mm), length and depth in its long unit
 * (ft or m). Converted to SI once, then checked by the very schema the API uses, so a field message
 * lands on the same field name whether it came from the browser or the server.
 */
export function segmentFormSchema(system: UnitSystem) {
  return z
    .object({
      siteId: z.string(),
      label: z.string(),
      fromAccessPointId: z.string(),
      toAccessPointId: z.string().nullish(),
      material: z.string(),
      nominalSizeMm: entered,
      insideDiameterMm: entered,
      lengthMm: entered,
      depthMm: entered,
    })
    .transform((form): SegmentInput => ({
      ...form,
      material: form.material as SegmentInput['material'],
      toAccessPointId: form.toAccessPointId || null,
      // A blank required size goes on as undefined: the API schema's "Enter the …" message reports it.
      nominalSizeMm: enteredToMm(form.nominalSizeMm, system, 'short') as number,
      insideDiameterMm: enteredToMm(form.insideDiameterMm, system, 'short', 1) as number,
      lengthMm: enteredToMm(form.lengthMm, system, 'long') as number,
      depthMm: enteredToMm(form.depthMm, system, 'long') ?? null,
    }))
    .pipe(segmentInputSchema);
}
