import { z } from 'zod';
import { CUSTOMER_KINDS } from '@/lib/domain/vocabulary';
import { optionalText } from './common';
import { listQuerySchema } from './list';

// No defaults here: a PATCH must leave out what it does not change.
const customerFields = {
  name: z.string().trim().min(1, 'Enter the customer’s name').max(200, 'At most 200 characters'),
  kind: z.enum(CUSTOMER_KINDS, { error: 'Pick a kind of customer' }),
  contactName: optionalText(200),
  email: z
    .string()
    .trim()
    .max(254)
    .transform((value) => value.toLowerCase() || null)
    .pipe(z.email('Enter an e-mail address like name@example.com').nullable())
    .nullish(),
  phone: optionalText(40),
  billingAddress: optionalText(500),
  notes: optionalText(2000),
};

/** A customer as the office enters it; the form and POST /api/customers use this same schema. */
export const customerInputSchema = z.object({ ...customerFields, kind: customerFields.kind.default('homeowner') });
export type CustomerInput = z.input<typeof customerInputSchema>;

export const customerPatchSchema = z.object(customerFields).partial().strict();

export const CUSTOMER_SORT_KEYS = ['name', 'kind', 'createdAt'] as const;
export const customerListQuerySchema = listQuerySchema(CUSTOMER_SORT_KEYS, { sort: 'name' }).and(
  z.object({ kind: z.enum(CUSTOMER_KINDS, { error: 'Unknown kind of customer' }).optional() }),
);
export type CustomerListQuery = z.infer<typeof customerListQuerySchema>;
