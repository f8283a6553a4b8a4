import { z } from 'zod';
import { LOCALES } from '@/i18n/locales';

/** PATCH /api/profile: what a signed-in user may change about themself. `locale: null` follows the browser. */
export const profilePatchSchema = z
  .object({ locale: z.enum(LOCALES, { error: 'Pick English, Spanish or your browser’s language' }).nullable() })
  .strict();
export type ProfilePatch = z.output<typeof profilePatchSchema>;
