import { z } from 'zod';
import { uuidSchema } from './common';
import { listQuerySchema } from './list';

/** A generous ceiling: the schedule only compares a day's bookings against it. */
export const MAX_DAILY_CAPACITY = 50;

const crewFields = {
  name: z
    .string({ error: 'Enter the crew’s name' })
    .trim()
    .min(1, 'Enter the crew’s name')
    .max(100, 'At most 100 characters'),
  dailyCapacity: z
    .number({ error: 'Enter the jobs a day as a whole number' })
    .int('Enter a whole number of jobs')
    .min(1, 'At least 1 job a day')
    .max(MAX_DAILY_CAPACITY, `At most ${MAX_DAILY_CAPACITY} jobs a day`),
};

/** POST /api/crews and the crew form. */
export const crewInputSchema = z.object(crewFields).strict();
export type CrewInput = z.input<typeof crewInputSchema>;

/** PATCH /api/crews/:id; `archived: false` brings an archived crew back. */
export const crewPatchSchema = z
  .object({ ...crewFields, archived: z.literal(false, { error: 'Use DELETE to archive; archived: false restores' }) })
  .partial()
  .strict();

/** PUT /api/crews/:id/members: the whole membership, replacing what was there. */
export const crewMembersSchema = z
  .object({ userIds: z.array(uuidSchema, { error: 'userIds is a list of user ids' }).max(100, 'At most 100 members') })
  .strict()
  .transform(({ userIds }) => ({ userIds: [...new Set(userIds)] }));

export const CREW_SORT_KEYS = ['name', 'dailyCapacity', 'createdAt'] as const;
export const crewListQuerySchema = listQuerySchema(CREW_SORT_KEYS, { sort: 'name' });
export type CrewListQuery = z.infer<typeof crewListQuerySchema>;
