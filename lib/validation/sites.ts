import { z } from 'zod';
import { optionalText, uuidSchema } from './common';
import { listQuerySchema } from './list';

const required = (max: number, message: string) =>
  z.string().trim().min(1, message).max(max, `At most ${max} characters`);

// No defaults here: a PATCH must leave out what it does not change.
const siteFields = {
  name: required(200, 'Enter a name for the site'),
  addressLine: required(300, 'Enter the street address'),
  city: required(120, 'Enter the city'),
  region: optionalText(120),
  postalCode: optionalText(20),
  notes: optionalText(2000),
};

/** A site as the office enters it; the form and POST /api/sites use this same schema. */
export const siteInputSchema = z.object({
  customerId: z.uuid('Pick the customer this site belongs to'),
  ...siteFields,
});
export type SiteInput = z.input<typeof siteInputSchema>;

/**
 * The customer is fixed once the site exists: its jobs carry the same customer, and moving the
 * site would leave them pointing at two owners. (A site entered under the wrong customer is archived and made again.)
 */
export const sitePatchSchema = z.object(siteFields).partial().strict();

export const SITE_SORT_KEYS = ['name', 'city', 'createdAt'] as const;
export const siteListQuerySchema = listQuerySchema(SITE_SORT_KEYS, { sort: 'name' }).and(
  z.object({ customerId: uuidSchema.optional() }),
);
export type SiteListQuery = z.infer<typeof siteListQuerySchema>;
