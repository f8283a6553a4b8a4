import { z } from 'zod';

export const uuidSchema = z.uuid('Not a valid id');

/** True for a string `uuidSchema` accepts. */
export const isUuid = (value: unknown): value is string => uuidSchema.safeParse(value).success;

/** Page and size from a query string, with sane bounds. */
export const paginationSchema = z.object({
  page: z.coerce.number().int().min(1, 'page starts at 1').default(1),
  pageSize: z.coerce.number().int().min(1).max(100, 'pageSize is at most 100').default(25),
});

export const isoDateSchema = z.iso.date('Use a date like 2026-12-01');

/** Free text that may be left empty: '' and null both store NULL; undefined leaves a PATCH field alone. */
export const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max, `At most ${max} characters`)
    .transform((value) => value || null)
    .nullish();

/** A filter left on "Any" arrives as ''; it means no filter. */
export const blankAsUndefined = <S extends z.ZodType>(schema: S) =>
  z.preprocess((value) => (value === '' ? undefined : value), schema);
