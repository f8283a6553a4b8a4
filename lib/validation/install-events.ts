import { z } from 'zod';
import { INSTALL_EVENT_TYPES } from '@/lib/domain/vocabulary';
import { uuidSchema } from './common';

// Payload of each install event type. Shared by the tablet (before it queues a tap) and the
// server (before it stores one). Quantities are SI: °C, kPa, mm, seconds.

const temperatureC = z.number().finite().min(-20, 'below −20 °C').max(60, 'above 60 °C');
const pressureKpa = z
  .number()
  .finite()
  .positive('a pressure above zero')
  .max(1000, 'over 1000 kPa: check the gauge units');
const reason = z.string().trim().min(3, 'Say why in a few words').max(1000);

export const eventPayloadSchemas = {
  safety_acknowledged: z.object({}).strict(),
  checks_done: z.object({
    items: z
      .array(z.object({ id: z.string().min(1), ok: z.boolean(), note: z.string().trim().max(500).optional() }))
      .min(1),
  }),
  dry_run_started: z.object({}).strict(),
  dry_run_finished: z.object({
    seconds: z
      .number()
      .int()
      .min(1)
      .max(4 * 3600),
  }),
  conditions_recorded: z.object({
    // The resin at the bucket and the air at the mixing place: the warmer sets the working window.
    mixTempC: temperatureC,
    airTempC: temperatureC.optional(),
    // Wet-out and loading: minutes from mixing until the patch is on the packer.
    prepMinutes: z.number().finite().min(0, 'not below 0 min').max(240, 'over 4 h: check the minutes').optional(),
    pipeTempC: temperatureC,
    resinKitId: uuidSchema,
    packerId: uuidSchema,
    patchLengthMm: z.number().int().positive().max(10_000),
  }),
  // makerHoldMin: the hold time from the resin maker's sheet, asked when the pipe is outside the rated range.
  go_decision: z.object({
    go: z.boolean(),
    overrideReason: reason.optional(),
    makerHoldMin: z
      .number()
      .finite()
      .positive('a hold above zero')
      .max(7 * 24 * 60, 'over 7 days: check the minutes')
      .optional(),
  }),
  resin_mixed: z.object({}).strict(),
  patch_loaded: z.object({}).strict(),
  packer_in_position: z.object({}).strict(),
  bladder_inflated: z.object({ pressureKpa, confirmedOutOfRange: z.boolean().optional() }),
  pressure_reading: z.object({ pressureKpa, confirmedOutOfRange: z.boolean().optional() }),
  bladder_deflated: z.object({ reason: reason.optional(), confirmedEarly: z.boolean().optional() }),
  inspection_recorded: z.object({ result: z.enum(['pass', 'fail']), notes: z.string().trim().max(2000).optional() }),
  signed_off: z.object({ name: z.string().trim().min(2).max(200) }),
  note: z.object({ text: z.string().trim().min(1).max(2000) }),
  // A correction names the event it corrects (correctsEventId on the body) and says why;
  // `deviceTime` and/or `payload` carry the corrected values.
  correction: z.object({
    reason,
    deviceTime: z.iso.datetime({ offset: true }).optional(),
    payload: z.record(z.string(), z.unknown()).optional(),
  }),
} satisfies Record<(typeof INSTALL_EVENT_TYPES)[number], z.ZodType>;

export type EventPayloads = { [K in keyof typeof eventPayloadSchemas]: z.infer<(typeof eventPayloadSchemas)[K]> };

/** The body of POST /api/installs/:id/events, before the per-type payload check. */
export const eventBodySchema = z.object({
  clientEventId: uuidSchema,
  type: z.enum(INSTALL_EVENT_TYPES, { error: 'Unknown event type' }),
  deviceTime: z.iso.datetime({ offset: true, error: 'deviceTime must be an ISO date-time' }),
  payload: z.record(z.string(), z.unknown()).default({}),
  correctsEventId: uuidSchema.optional(),
  // The user who tapped it, as the tablet recorded it; when given it must be whoever is signed in.
  userId: uuidSchema.optional(),
});

export type EventBody = z.infer<typeof eventBodySchema>;

// Only a correction names another event, and it must name one and change something (the
// database refuses the first two otherwise; the third would be a correction of nothing).
const correctionLinkSchema = z
  .object({ type: z.string(), correctsEventId: z.string().optional(), payload: z.record(z.string(), z.unknown()) })
  .superRefine((body, ctx) => {
    const isCorrection = body.type === 'correction';
    if (isCorrection && !body.correctsEventId) {
      ctx.addIssue({ code: 'custom', path: ['correctsEventId'], message: 'Say which event this corrects' });
    }
    if (!isCorrection && body.correctsEventId) {
      ctx.addIssue({ code: 'custom', path: ['correctsEventId'], message: 'Only a correction names another event' });
    }
    if (isCorrection && body.payload.deviceTime === undefined && body.payload.payload === undefined) {
      ctx.addIssue({ code: 'custom', path: ['payload'], message: 'Give the corrected time or values' });
    }
  });

/** Validates the body and then its payload against the schema of its type. */
export function parseEventBody(input: unknown) {
  const body = eventBodySchema.safeParse(input);
  if (!body.success) return body;
  const link = correctionLinkSchema.safeParse(body.data);
  if (!link.success) return { success: false as const, error: link.error };
  const payload = eventPayloadSchemas[body.data.type].safeParse(body.data.payload);
  if (!payload.success) {
    return { success: false as const, error: payload.error, path: 'payload' };
  }
  return { success: true as const, data: { ...body.data, payload: payload.data as Record<string, unknown> } };
}

/** The body of POST /api/installs: the id is made on the device, so a retried create finds the first. */
export const createInstallSchema = z.object({ id: uuidSchema, repairId: uuidSchema });

export type CreateInstallInput = z.infer<typeof createInstallSchema>;

/** The body of POST /api/installs/:id/redo: the new install's id may be made on the device, so a retry finds the first. */
export const redoInstallSchema = z.object({ id: uuidSchema.optional() }).strict();

export type RedoInstallInput = z.infer<typeof redoInstallSchema>;
