import { z } from 'zod';
import { invoiceInputSchema, type InvoiceInput } from './invoices';

/** What the office types: prices in the currency's main unit (dollars, euros), as text. */
export type InvoiceFormValues = {
  jobId: string;
  currency: string;
  taxRatePct: string;
  dueOn: string;
  notes?: string;
  lines: { repairId?: string | null; description: string; quantity: string; unitPrice: string }[];
};

/**
 * The form's schema: prices turned into cents, then checked by the very schema POST /api/invoices uses
 * (a price that is not money, like "12.345", becomes NaN and is refused there).
 */
export const invoiceFormSchema = z.preprocess((values) => {
  const form = values as InvoiceFormValues;
  return {
    ...form,
    lines: form.lines.map(({ unitPrice, ...line }) => ({ ...line, unitPriceCents: toCents(unitPrice) })),
  };
}, invoiceInputSchema) as unknown as z.ZodType<InvoiceInput, InvoiceFormValues>; // preprocess types its input as unknown

/** "1850.5" → 185050, digit by digit (no floating-point rounding of money); anything else → NaN. */
export function toCents(text: string): number {
  const match = text.trim().match(/^(\d+)(?:\.(\d{1,2}))?$/);
  if (!match) return Number.NaN;
  return Number(match[1]) * 100 + Number((match[2] ?? '').padEnd(2, '0'));
}
