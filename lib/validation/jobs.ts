import { z } from 'zod';
import { JOB_STATUSES } from '@/lib/domain';
import { isoDateSchema, paginationSchema, uuidSchema } from './common';

export const JOB_SORT_KEYS = ['number', 'scheduledDate', 'status', 'createdAt'] as const;

export const jobListQuerySchema = paginationSchema.extend({
  q: z.string().trim().max(100).optional(),
  status: z
    .string()
    .optional()
    .transform((value) => (value ? value.split(',').filter(Boolean) : undefined))
    .pipe(z.array(z.enum(JOB_STATUSES, { error: 'Unknown job status' })).optional()),
  crewId: uuidSchema.optional(),
  from: isoDateSchema.optional(),
  to: isoDateSchema.optional(),
  sort: z.enum(JOB_SORT_KEYS).default('scheduledDate'),
  dir: z.enum(['asc', 'desc']).default('desc'),
});

export type JobListQuery = z.infer<typeof jobListQuerySchema>;
