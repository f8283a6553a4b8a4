import { z } from 'zod';
import { paginationSchema } from './common';

/**
 * The query every list route and list page takes: `?page=&pageSize=&sort=&q=` (+ `dir`, `archived`).
 * `sort` is one of the list's keys, or the key with a leading `-` for descending; `dir` overrides.
 */
export function listQuerySchema<const K extends readonly [string, ...string[]]>(
  sortKeys: K,
  defaults: { sort: K[number]; dir?: 'asc' | 'desc' },
) {
  return paginationSchema
    .extend({
      q: z.string().trim().max(100, 'Search is at most 100 characters').optional(),
      sort: z
        .string()
        .optional()
        .refine((value) => !value || (sortKeys as readonly string[]).includes(value.replace(/^-/, '')), {
          message: `Sort by one of: ${sortKeys.join(', ')}`,
        }),
      dir: z.enum(['asc', 'desc']).optional(),
      archived: z.enum(['true', 'false', 'only']).default('false'),
    })
    .transform(({ sort, dir, ...rest }) => {
      const key = (sort?.replace(/^-/, '') || defaults.sort) as K[number];
      const direction = dir ?? (sort?.startsWith('-') ? 'desc' : sort ? 'asc' : (defaults.dir ?? 'asc'));
      return { ...rest, sort: key, dir: direction as 'asc' | 'desc' };
    });
}

export type ListQuery<K extends string = string> = {
  page: number;
  pageSize: number;
  q?: string;
  sort: K;
  dir: 'asc' | 'desc';
  archived: 'true' | 'false' | 'only';
};

/** Query parameters without the blank ones: a filter left on "Any" submits `kind=`, which means no filter. */
export function filledParams(raw: Record<string, string | string[] | undefined>): Record<string, string> {
  return Object.fromEntries(
    Object.entries(raw).filter(
      (entry): entry is [string, string] => typeof entry[1] === 'string' && entry[1].trim() !== '',
    ),
  );
}

/**
 * A list page's query from its URL: a hand-edited URL with a bad value falls back to the defaults (or `fallback`)
 * rather than failing the page.
 */
export function queryOrDefaults<S extends z.ZodType>(schema: S, params: unknown, fallback: unknown = {}): z.output<S> {
  const parsed = schema.safeParse(params);
  return parsed.success ? parsed.data : schema.parse(fallback);
}
