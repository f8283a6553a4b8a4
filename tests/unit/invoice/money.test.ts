import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { formatMoney, invoiceTotals, lineAmountCents, percentToBp, taxCents } from '@/lib/invoice/money';

describe('invoice money in integer cents', () => {
  it('multiplies quantity by unit price to the cent, half up', () => {
    expect(lineAmountCents(1, 185_000)).toBe(185_000);
    expect(lineAmountCents(2.5, 1999)).toBe(4998); // 49.975 → 49.98 (half up)
    expect(lineAmountCents(0.333, 100)).toBe(33); // 33.3 → 33
    // 1.005 is 1.00499999… as a double; counting thousandths keeps it exact.
    expect(lineAmountCents(1.005, 1000)).toBe(1005);
  });

  it('refuses a zero or negative quantity and a fractional price', () => {
    expect(() => lineAmountCents(0, 100)).toThrow(RangeError);
    expect(() => lineAmountCents(1, 10.5)).toThrow(RangeError);
  });

  it('taxes the subtotal at a rate in basis points, half up', () => {
    // 8.25 % of $1,234.56 = $101.8512 → $101.85 (hand-computed).
    expect(taxCents(123_456, 825)).toBe(10_185);
    // 7 % of $0.50 = 3.5 ¢ → 4 ¢ (half up).
    expect(taxCents(50, 700)).toBe(4);
    expect(taxCents(99_999, 0)).toBe(0);
  });

  it('totals lines and tax; the total is always subtotal + tax', () => {
    const totals = invoiceTotals(
      [
        { quantity: 1, unitPriceCents: 185_000 },
        { quantity: 2, unitPriceCents: 12_550 },
      ],
      825,
    );
    expect(totals).toEqual({
      amounts: [185_000, 25_100],
      subtotalCents: 210_100,
      taxCents: 17_333,
      totalCents: 227_433,
    });
    fc.assert(
      fc.property(
        fc.array(
          fc.record({
            quantity: fc.integer({ min: 1, max: 100_000 }).map((n) => n / 1000),
            unitPriceCents: fc.integer({ min: 0, max: 1_000_000 }),
          }),
          { minLength: 1, maxLength: 20 },
        ),
        fc.integer({ min: 0, max: 5000 }),
        (lines, bp) => {
          const t = invoiceTotals(lines, bp);
          return Number.isInteger(t.totalCents) && t.totalCents === t.subtotalCents + t.taxCents && t.taxCents >= 0;
        },
      ),
    );
  });

  it('reads a typed percentage as basis points and formats money with Intl', () => {
    expect(percentToBp(8.25)).toBe(825);
    expect(percentToBp(0.1)).toBe(10);
    expect(formatMoney(227_433, 'usd')).toBe('$2,274.33');
    expect(formatMoney(5, 'eur', 'de-DE')).toBe('0,05\u00a0€');
  });
});
