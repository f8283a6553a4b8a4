import { z } from 'zod';
import type { JobStatus } from '@/lib/domain/vocabulary';

/** Statuses the schedule may still move (the server also refuses once an install has started on site). */
export const SCHEDULABLE_STATUSES: readonly JobStatus[] = ['draft', 'scheduled', 'in_progress', 'sent_back'];

/** `?week=YYYY-MM-DD`: any day of the week wanted (the board snaps it to its Monday); none means this week. */
export const scheduleQuerySchema = z.object({
  week: z.iso.date('Use a day of the week wanted, like 2026-11-30').optional(),
});
export type ScheduleQuery = z.infer<typeof scheduleQuerySchema>;

const scheduleFields = {
  crewId: z.uuid('Pick a crew'),
  date: z.iso.date('Pick a day, like 2026-11-30'),
};

/** PUT /api/jobs/:id/schedule: the crew and the calendar day (in the company's zone). */
export const scheduleInputSchema = z.object(scheduleFields).strict();
export type ScheduleInput = z.infer<typeof scheduleInputSchema>;

/** The board's form: the same fields plus which job. */
export const scheduleFormSchema = z.object({ jobId: z.uuid('Pick a job'), ...scheduleFields });
