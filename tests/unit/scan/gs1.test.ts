import { describe, expect, it } from 'vitest';
import { Gs1Error, gs1Date, looksLikeGs1, parseGs1, validCheckDigit } from '@/lib/scan/gs1';

// GTINs used as examples in GS1's own documents (from memory): 09506000134352 (GS1 Digital Link examples) and
// 95012345678903 (General Specifications, GTIN-14 examples). Their check digits are worked by hand below (§7.9.1).
const GTIN = '09506000134352';
const GS = '\u001d';
const TODAY = new Date('2026-12-02T12:00:00Z');

describe('GS1 check digit (General Specifications §7.9.1)', () => {
  it('accepts the published examples', () => {
    // 0950600013435: from the right 5·3+3+4·3+3+1·3+0+0+0+6·3+0+5·3+9+0 = 78 → check 2.
    expect(validCheckDigit(GTIN)).toBe(true);
    // 9501234567890: 0+9+8·3+7+6·3+5+4·3+3+2·3+1+0+5+9·3 = 117 → check 3.
    expect(validCheckDigit('95012345678903')).toBe(true);
  });
  it('refuses a changed digit', () => {
    expect(validCheckDigit('09506000134353')).toBe(false);
    expect(() => parseGs1('(01)09506000134353(10)A1')).toThrow(Gs1Error);
  });
});

describe('parseGs1: human-readable form', () => {
  it('reads GTIN, expiry and lot in any order', () => {
    const label = parseGs1(`(01)${GTIN}(17)271130(10)ABC123`, TODAY);
    expect(label).toMatchObject({ gtin: GTIN, expiresOn: '2027-11-30', lot: 'ABC123' });
    expect(label.elements.map((e) => e.ai)).toEqual(['01', '17', '10']);
    expect(parseGs1('(10)LOT-7 (17)270615', TODAY)).toMatchObject({ lot: 'LOT-7', expiresOn: '2027-06-15' });
  });
  it('reads serial (21) and production date (11)', () => {
    expect(parseGs1(`(01)${GTIN}(11)260510(21)SN0042`, TODAY)).toMatchObject({
      producedOn: '2026-05-10',
      serial: 'SN0042',
    });
  });
  it('refuses text that is not element strings', () => {
    expect(() => parseGs1('(10)ABC(17)2711', TODAY)).toThrow(/6 characters/);
    expect(() => parseGs1('(10)ABC junk(x)', TODAY)).toThrow(Gs1Error);
  });
});

describe('parseGs1: data as a scanner sends it', () => {
  it('splits variable-length fields at FNC1 (GS) and predefined-length ones by their length (§7.8.5)', () => {
    const raw = `]C101${GTIN}10ABC123${GS}17271130`;
    expect(parseGs1(raw, TODAY)).toMatchObject({ gtin: GTIN, lot: 'ABC123', expiresOn: '2027-11-30' });
  });
  it('needs no separator after a predefined-length field, and none at the end', () => {
    const raw = `]d201${GTIN}1727113010ABC123`;
    expect(parseGs1(raw, TODAY)).toMatchObject({ gtin: GTIN, lot: 'ABC123', expiresOn: '2027-11-30' });
  });
  it('reads a lot that ends the data without FNC1, and a leading FNC1', () => {
    expect(parseGs1(`${GS}10K-88${GS}21X1`, TODAY)).toMatchObject({ lot: 'K-88', serial: 'X1' });
  });
  it('reads four-digit AIs of predefined length (31nn: net weight) without losing the fields after them', () => {
    const label = parseGs1(`01${GTIN}3102001250${GS}10B7`, TODAY);
    expect(label.elements).toEqual([
      { ai: '01', value: GTIN, known: true },
      { ai: '3102', value: '001250', known: false },
      { ai: '10', value: 'B7', known: true },
    ]);
  });
  it('refuses a lot longer than 20 characters (AI 10 is X..20) and characters outside set 82', () => {
    expect(() => parseGs1(`10${'A'.repeat(21)}`, TODAY)).toThrow(/at most 20/);
    expect(() => parseGs1('10AB CD', TODAY)).toThrow(/characters/);
  });
  it('refuses a truncated GTIN', () => {
    expect(() => parseGs1('010950600013', TODAY)).toThrow(/14 characters/);
  });
});

describe('gs1Date (§3.4.6 expiry, §7.12 century)', () => {
  it('DD = 00 is the last day of the month, leap years included', () => {
    expect(gs1Date('270600', TODAY)).toBe('2027-06-30');
    expect(gs1Date('280200', TODAY)).toBe('2028-02-29');
    expect(gs1Date('270200', TODAY)).toBe('2027-02-28');
    expect(parseGs1('(17)271200', TODAY).expiresOn).toBe('2027-12-31');
  });
  it('a production date with DD = 00 gives only the month', () => {
    expect(gs1Date('260500', TODAY, false)).toBe('2026-05');
  });
  it('picks the century: up to 50 years ahead is this century, 51 or more ahead is the last one', () => {
    expect(gs1Date('760101', TODAY)).toBe('2076-01-01'); // 76 − 26 = 50
    expect(gs1Date('770101', TODAY)).toBe('1977-01-01'); // 77 − 26 = 51
    // In 2099, YY = 49 lies 50 years back: the next century (49 − 99 = −50).
    expect(gs1Date('490101', new Date('2099-06-01T00:00:00Z'))).toBe('2149-01-01');
    expect(gs1Date('500101', new Date('2099-06-01T00:00:00Z'))).toBe('2050-01-01');
  });
  it('refuses impossible dates', () => {
    expect(() => gs1Date('271301', TODAY)).toThrow(/month/);
    expect(() => gs1Date('270431', TODAY)).toThrow(/day 31/);
    expect(() => gs1Date('2704', TODAY)).toThrow(/YYMMDD/);
  });
});

describe('looksLikeGs1', () => {
  it('tells GS1 data from a plain lot barcode', () => {
    expect(looksLikeGs1(`]C110ABC${GS}17270600`)).toBe(true);
    expect(looksLikeGs1('(10)ABC')).toBe(true);
    expect(looksLikeGs1(`01${GTIN}`)).toBe(true);
    expect(looksLikeGs1('SAE-2610-014')).toBe(false);
  });
});
