import { z } from 'zod';

/** A live event id: the event's seq, a non-negative whole number (bigint, so kept as its decimal string). */
export const liveSeqSchema = z.string().regex(/^\d{1,18}$/, 'Not a live event id');

/** `GET /api/live`: `lastEventId` stands in for the Last-Event-ID header (which wins when both are sent). */
export const liveQuerySchema = z
  .object({
    lastEventId: liveSeqSchema.optional(),
    once: z.enum(['1', 'true'], { error: 'once is 1 or true' }).optional(),
  })
  .strict();
