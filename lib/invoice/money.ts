// Invoice arithmetic in integer cents, so totals never drift by floating-point error.
// Rounding: each line to the cent, half up, then tax on the subtotal, half up — common practice for
// small-business invoicing; some tax authorities prescribe otherwise, which the office can see per line.

export const MAX_QUANTITY = 100_000;
export const MAX_UNIT_PRICE_CENTS = 10_000_000;

/** quantity × unit price, in cents (quantity to 3 decimals, e.g. 2.5 m or 1 repair). */
export function lineAmountCents(quantity: number, unitPriceCents: number): number {
  if (!(quantity > 0) || quantity > MAX_QUANTITY) throw new RangeError('quantity out of range');
  if (!Number.isInteger(unitPriceCents) || unitPriceCents < 0 || unitPriceCents > MAX_UNIT_PRICE_CENTS)
    throw new RangeError('unit price out of range');
  const thousandths = Math.round(quantity * 1000);
  return Math.floor((thousandths * unitPriceCents + 500) / 1000);
}

/** Tax on a subtotal at a rate in basis points (825 = 8.25 %). */
export function taxCents(subtotalCents: number, rateBp: number): number {
  return Math.floor((subtotalCents * rateBp + 5000) / 10_000);
}

export function invoiceTotals(lines: { quantity: number; unitPriceCents: number }[], rateBp: number) {
  const amounts = lines.map((line) => lineAmountCents(line.quantity, line.unitPriceCents));
  const subtotalCents = amounts.reduce((sum, amount) => sum + amount, 0);
  const tax = taxCents(subtotalCents, rateBp);
  return { amounts, subtotalCents, taxCents: tax, totalCents: subtotalCents + tax };
}

/** A percentage typed by a person ("8.25") as basis points (825). */
export const percentToBp = (percent: number) => Math.round(percent * 100);
export const bpToPercent = (bp: number) => bp / 100;

/** Cents shown as money in the given currency (Intl does the symbol and grouping). */
export function formatMoney(cents: number, currency: string, locale = 'en-US'): string {
  return new Intl.NumberFormat(locale, { style: 'currency', currency: currency.toUpperCase() }).format(cents / 100);
}
