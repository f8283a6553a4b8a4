import { z } from 'zod';
import { JOB_STATUSES } from '@/lib/domain/vocabulary';
import { isoDateSchema, optionalText, uuidSchema } from './common';
import { listQuerySchema } from './list';

export const JOB_SORT_KEYS = ['number', 'scheduledDate', 'status', 'title', 'createdAt'] as const;

/** A comma list of codes from a query string (`status=draft,scheduled`). */
export const codeListSchema = <const T extends readonly [string, ...string[]]>(codes: T, message: string) =>
  z
    .string()
    .optional()
    .transform((value) => (value ? value.split(',').filter(Boolean) : undefined))
    .pipe(z.array(z.enum(codes, { error: message })).optional());

export const jobListQuerySchema = listQuerySchema(JOB_SORT_KEYS, { sort: 'scheduledDate', dir: 'desc' }).and(
  z.object({
    status: codeListSchema(JOB_STATUSES, 'Unknown job status'),
    crewId: uuidSchema.optional(),
    from: isoDateSchema.optional(),
    to: isoDateSchema.optional(),
  }),
);
export type JobListQuery = z.infer<typeof jobListQuerySchema>;

/** An id a form may leave empty ('' from a "None" option): '' and null both store NULL. */
export const optionalId = (message: string) =>
  z
    .string()
    .trim()
    .transform((value) => value || null)
    .pipe(z.uuid(message).nullable())
    .nullish();

// No defaults here: a PATCH must leave out what it does not change.
const jobFields = {
  customerId: z.uuid('Pick the customer'),
  siteId: z.uuid('Pick the site'),
  title: z.string().trim().min(1, 'Enter a short title for the job').max(200, 'At most 200 characters'),
  notes: optionalText(4000),
  crewId: optionalId('Pick a crew or none'),
  scheduledDate: z
    .string()
    .trim()
    .transform((value) => value || null)
    .pipe(isoDateSchema.nullable())
    .nullish(),
};

/** A job as the office enters it; the form and POST /api/jobs use this same schema. */
export const jobInputSchema = z.object(jobFields);
export type JobInput = z.input<typeof jobInputSchema>;

/** PATCH /api/jobs/:id: any of the fields, and a status change the office may make (checked against the current status). */
export const jobPatchSchema = z
  .object({ ...jobFields, status: z.enum(JOB_STATUSES, { error: 'Unknown job status' }) })
  .partial()
  .strict();
export type JobPatch = z.output<typeof jobPatchSchema>;
