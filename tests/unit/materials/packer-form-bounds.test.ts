import { describe, expect, it } from 'vitest';
import { packerFormSchema, packerInputSchema } from '@/lib/validation/packers';

// 3 000 mm = 118.11 in, 10 000 mm = 393.70 in (1 in = 25.4 mm, exact); 2 000 kPa = 290 psi
// (1 psi = 6.894 757 kPa) — NIST SP 811 (2008) App. B.
const packer = {
  name: 'Test packer',
  serial: '',
  minDiameterMm: 6,
  maxDiameterMm: 200,
  bladderLengthMm: 40,
  endMarginMm: 4,
  minPressureKpa: 10,
  maxPressureKpa: 350,
};
const messages = (system: 'imperial' | 'metric', values: object) => {
  const result = packerFormSchema(system).safeParse({ ...packer, ...values });
  return Object.fromEntries((result.error?.issues ?? []).map((issue) => [issue.path.join('.'), issue.message]));
};

describe('packer form range errors in the company’s units', () => {
  it('imperial: inches and psi, never mm or kPa', () => {
    const fields = messages('imperial', { maxDiameterMm: 200, bladderLengthMm: 400 });
    expect(fields.maxDiameterMm).toBe('From 0.04 in to 118.11 in');
    expect(fields.bladderLengthMm).toBe('From 0.04 in to 393.70 in');
    expect(fields.maxPressureKpa).toBe('From 0 psi to 290 psi');
    expect(Object.values(fields).join(' ')).not.toMatch(/mm|kPa/);
  });

  it('metric: mm and kPa', () => {
    const fields = messages('metric', {
      minDiameterMm: 150,
      maxDiameterMm: 3001,
      bladderLengthMm: 1200,
      endMarginMm: 100,
      maxPressureKpa: 2001,
    });
    expect(fields.maxDiameterMm).toBe('From 1 mm to 3000 mm');
    expect(fields.maxPressureKpa).toBe('From 0 kPa to 2000 kPa');
  });

  it('the API (SI) keeps SI wording', () => {
    const result = packerInputSchema.safeParse({
      ...packer,
      minDiameterMm: 150,
      maxDiameterMm: 3001,
      bladderLengthMm: 1200,
      endMarginMm: 100,
      maxPressureKpa: 300,
    });
    expect(result.error!.issues[0].message).toBe('From 1 mm to 3000 mm');
  });
});
