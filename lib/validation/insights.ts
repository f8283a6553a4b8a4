import { z } from 'zod';
import { blankAsUndefined, isoDateSchema, uuidSchema } from './common';

/** The longest period one insights request covers (inclusive days: two years, a leap day included). */
export const MAX_INSIGHTS_DAYS = 731;

const DAY_MS = 86_400_000;
const dayNumber = (day: string) => Date.parse(`${day}T00:00:00Z`) / DAY_MS;

/**
 * `?from=YYYY-MM-DD&to=YYYY-MM-DD&crewId=&format=csv` — days in the company's zone, both included.
 * Left out, the period is the last 12 weeks up to today (filled in by lib/data, which knows the zone).
 */
export const insightsQuerySchema = z
  .object({
    from: blankAsUndefined(isoDateSchema.optional()),
    to: blankAsUndefined(isoDateSchema.optional()),
    crewId: blankAsUndefined(uuidSchema.optional()),
    format: blankAsUndefined(z.enum(['json', 'csv']).optional()),
  })
  .strict()
  .superRefine((query, ctx) => {
    if (!query.from || !query.to) return;
    const days = dayNumber(query.to) - dayNumber(query.from) + 1;
    if (days < 1) ctx.addIssue({ code: 'custom', path: ['to'], message: 'The period ends before it starts' });
    else if (days > MAX_INSIGHTS_DAYS)
      ctx.addIssue({ code: 'custom', path: ['to'], message: 'Choose a period of at most two years' });
  });

export type InsightsQuery = z.output<typeof insightsQuerySchema>;
