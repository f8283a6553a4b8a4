import { z } from 'zod';
import { INVOICE_STATUSES } from '@/lib/domain/vocabulary';
import { MAX_QUANTITY, MAX_UNIT_PRICE_CENTS } from '@/lib/invoice/money';
import { isoDateSchema, optionalText, uuidSchema } from './common';
import { listQuerySchema } from './list';

export const CURRENCIES = ['usd', 'cad', 'eur', 'gbp', 'aud', 'nzd', 'chf'] as const;

export const invoiceLineSchema = z.object({
  repairId: uuidSchema.nullish(),
  description: z.string().trim().min(1, 'Describe the line').max(300, 'At most 300 characters'),
  quantity: z.coerce
    .number({ error: 'Enter a quantity' })
    .positive('Quantity must be more than 0')
    .max(MAX_QUANTITY, `At most ${MAX_QUANTITY}`)
    .refine((value) => Math.abs(value * 1000 - Math.round(value * 1000)) < 1e-6, 'At most 3 decimals'),
  unitPriceCents: z.coerce
    .number({ error: 'Enter a unit price' })
    .int('Unit price is in whole cents')
    .min(0, 'A price cannot be negative')
    .max(MAX_UNIT_PRICE_CENTS, 'Unit price is too large'),
});

const invoiceFields = {
  taxRatePct: z.coerce
    .number({ error: 'Enter a tax rate' })
    .min(0, 'Tax cannot be negative')
    .max(50, 'At most 50 %')
    .refine((value) => Math.abs(value * 100 - Math.round(value * 100)) < 1e-6, 'At most 2 decimals'),
  dueOn: isoDateSchema,
  currency: z.enum(CURRENCIES, { error: 'Pick a currency' }),
  notes: optionalText(2000),
  lines: z.array(invoiceLineSchema).min(1, 'An invoice needs at least one line').max(100, 'At most 100 lines'),
};

/** POST /api/invoices: a draft invoice for a job; the same schema checks the office's form. */
export const invoiceInputSchema = z.object({
  jobId: uuidSchema,
  ...invoiceFields,
  currency: invoiceFields.currency.default('usd'),
});
export type InvoiceInput = z.output<typeof invoiceInputSchema>;

/** PATCH /api/invoices/:id while draft (no defaults: what is left out stays). */
export const invoicePatchSchema = z.object(invoiceFields).partial().strict();

/** POST /api/invoices/:id/status: issue (draft → issued) or void (draft/issued → void). */
export const invoiceActionSchema = z.object({
  action: z.enum(['issue', 'void'], { error: 'Use issue or void' }),
  reason: optionalText(500),
});

export const INVOICE_SORT_KEYS = ['number', 'dueOn', 'totalCents', 'status', 'createdAt'] as const;
export const invoiceListQuerySchema = listQuerySchema(INVOICE_SORT_KEYS, { sort: 'createdAt', dir: 'desc' }).and(
  z.object({
    status: z.enum(INVOICE_STATUSES, { error: 'Unknown invoice status' }).optional(),
    jobId: uuidSchema.optional(),
  }),
);
export type InvoiceListQuery = z.infer<typeof invoiceListQuerySchema>;
