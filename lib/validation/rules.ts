import { z } from 'zod';
import { AppError } from '@/lib/server/errors';

/**
 * Rules across fields (min below max, pot life before hold…), written once over a whole record and
 * used twice: by the create schema (and so by the form) and by a PATCH on the record as it will be.
 */
export type Problems = Record<string, string>;

/** Puts each problem on its field of a zod refinement. */
export function addProblems(ctx: z.RefinementCtx, problems: Problems) {
  for (const [field, message] of Object.entries(problems))
    ctx.addIssue({ code: 'custom', message, path: field.split('.') });
}

/** A 400 with the same `{ message, fields }` shape as a failed zod parse, when there is any problem. */
export function throwProblems(problems: Problems) {
  const entries = Object.entries(problems);
  if (entries.length === 0) return;
  const [field, message] = entries[0];
  throw new AppError(
    400,
    `Invalid input — ${field}: ${message}`,
    Object.fromEntries(entries.map(([key, text]) => [key, [text]])),
  );
}

/**
 * A measured quantity as the API takes it: a finite JSON number within bounds, rounded to its column's scale.
 * `bounds` is the sentence shown when it is out of range (say the unit there).
 */
export function quantity({
  min,
  max,
  scale,
  above = false,
  bounds,
}: {
  min: number;
  max: number;
  scale: number;
  above?: boolean;
  bounds: string;
}) {
  const base = z.number({ error: 'Enter a number' });
  const rounded = (above ? base.gt(min, bounds) : base.min(min, bounds))
    .max(max, bounds)
    .transform((value) => roundTo(value, scale));
  // "More than min" holds for what is stored: 0.000001 passes `gt(0)` but rounds to 0 in the column.
  return above ? rounded.refine((value) => value > min, bounds) : rounded;
}

/** Rounds to `scale` decimals (0 for whole numbers), as a NUMERIC(p, scale) column would store it. */
export function roundTo(value: number, scale: number) {
  const factor = 10 ** scale;
  return Math.round(value * factor) / factor;
}

/**
 * A desk form's schema: the values typed in the company's units are converted to SI by `toSi`, then
 * checked by the very schema the server uses. The form's field names are the API's, so the server's
 * field messages land on the same controls.
 */
export function inCompanyUnits<Out, In>(toSi: (values: In) => unknown, schema: z.ZodType<Out>): z.ZodType<Out, In> {
  return z.preprocess((raw) => toSi(raw as In), schema) as unknown as z.ZodType<Out, In>;
}

/** Converts a typed number; an empty field (NaN) or a missing one passes through for the schema to name. */
export const ifFinite = (convert: (value: number) => number) => (value: unknown) =>
  typeof value === 'number' && Number.isFinite(value) ? convert(value) : value;
