import { z } from 'zod';
import { optionalText } from './common';

/** "Send repair report": both fields optional; `to` falls back to the customer's e-mail. */
export const sendReportSchema = z
  .object({
    to: z
      .string()
      .trim()
      .max(254, 'At most 254 characters')
      .transform((value) => value.toLowerCase() || null)
      .pipe(z.email('Enter an e-mail address like name@example.com').nullable())
      .nullish(),
    message: optionalText(2000),
  })
  .strict();
export type SendReportInput = z.input<typeof sendReportSchema>;
export type SendReport = z.infer<typeof sendReportSchema>;
