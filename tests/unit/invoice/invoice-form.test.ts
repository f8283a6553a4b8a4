import { describe, expect, it } from 'vitest';
import { invoiceFormSchema, toCents } from '@/lib/validation/invoice-form';

const form = (unitPrice: string) => ({
  jobId: '0b9f9d0e-7f55-4a53-8d6a-0a3c8b3a1c11',
  currency: 'usd',
  taxRatePct: '8.25',
  dueOn: '2026-12-31',
  lines: [{ description: 'Point repair', quantity: '1', unitPrice }],
});

describe('invoice form', () => {
  it('reads typed money as cents digit by digit', () => {
    expect(toCents('1850')).toBe(185_000);
    expect(toCents('1850.5')).toBe(185_050);
    expect(toCents('0.07')).toBe(7);
    expect(toCents('19.99')).toBe(1999); // 19.99 * 100 is 1998.9999999999998 as a double
    expect(toCents('12.345')).toBeNaN();
    expect(toCents('-3')).toBeNaN();
  });

  it('hands the API schema cents and coerced numbers, and refuses a price that is not money', () => {
    const ok = invoiceFormSchema.safeParse(form('1850.50'));
    expect(ok.success && ok.data).toMatchObject({
      taxRatePct: 8.25,
      lines: [{ quantity: 1, unitPriceCents: 185_050 }],
    });
    const bad = invoiceFormSchema.safeParse(form('12.345'));
    expect(bad.success).toBe(false);
    expect(bad.error?.issues[0].path).toEqual(['lines', 0, 'unitPriceCents']);
  });
});
