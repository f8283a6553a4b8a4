import { describe, expect, it } from 'vitest';
import { enteredToMm, mmToEntered, nominalToEntered } from '@/lib/units/entry';
import { segmentFormSchema } from '@/lib/validation/segments';

// Check values from the exact definitions 1 in = 25.4 mm and 1 ft = 304.8 mm (NIST SP 811, App. B).
describe('length entry in desk forms', () => {
  it('turns entered inches and feet into millimetres, rounded to the stored precision', () => {
    expect(enteredToMm(8, 'imperial', 'short')).toBe(203); // 203.2 mm
    expect(enteredToMm(7.874, 'imperial', 'short', 1)).toBe(200); // 199.9996 mm
    expect(enteredToMm(164.042, 'imperial', 'long')).toBe(50000); // 49 999.99 mm
    expect(enteredToMm(6, 'imperial', 'long')).toBe(1829); // 1828.8 mm
    expect(enteredToMm(148.5, 'metric', 'short', 1)).toBe(148.5);
    expect(enteredToMm(22.5, 'metric', 'long')).toBe(22500);
    expect(enteredToMm(null, 'imperial', 'long')).toBeNull();
    expect(enteredToMm(undefined, 'metric', 'short')).toBeUndefined();
  });

  it('shows stored millimetres in the company unit and survives the round trip unchanged', () => {
    expect(mmToEntered(200, 'imperial', 'short')).toBe(7.874);
    expect(mmToEntered(50000, 'imperial', 'long')).toBe(164.042);
    expect(mmToEntered(148.5, 'metric', 'short')).toBe(148.5);
    expect(mmToEntered(22500, 'metric', 'long')).toBe(22.5);
    expect(mmToEntered(null, 'metric', 'long')).toBeNull();
    for (const mm of [1, 99, 152, 203, 1829, 12345, 999_999]) {
      for (const kind of ['short', 'long'] as const) {
        expect(enteredToMm(mmToEntered(mm, 'imperial', kind), 'imperial', kind)).toBe(mm);
      }
    }
    for (const tenths of [1000, 1016, 1485, 2032, 6096]) {
      const mm = tenths / 10;
      expect(enteredToMm(mmToEntered(mm, 'imperial', 'short'), 'imperial', 'short', 1)).toBe(mm);
    }
  });
});

describe('nominal sizes in the form', () => {
  it('shows an inch trade size to the nearest eighth and metric sizes in whole millimetres', () => {
    expect(nominalToEntered(203, 'imperial')).toBe(8); // 7.992 in
    expect(nominalToEntered(32, 'imperial')).toBe(1.25); // 1.260 in
    expect(nominalToEntered(64, 'imperial')).toBe(2.5); // 2.520 in
    expect(nominalToEntered(150, 'metric')).toBe(150);
    expect(nominalToEntered(null, 'imperial')).toBeNull();
    // Typed back unchanged, an inch trade size lands on the same millimetres.
    for (const inches of [1.25, 2.5, 4, 6, 8, 10, 12, 15, 18, 24, 36]) {
      const mm = enteredToMm(inches, 'imperial', 'short');
      expect(enteredToMm(nominalToEntered(mm, 'imperial'), 'imperial', 'short')).toBe(mm);
    }
  });
});

describe('segment form schema', () => {
  const ids = {
    siteId: '6d1c9a8e-3f2b-4c5d-9e7f-0a1b2c3d4e5f',
    fromAccessPointId: '7e2d0b9f-4a3c-4d6e-8f0a-1b2c3d4e5f60',
    toAccessPointId: '',
  };
  it('converts an imperial entry to the SI body the API takes', () => {
    const result = segmentFormSchema('imperial').safeParse({
      ...ids,
      label: 'MH-1 → MH-2',
      material: 'vitrified_clay',
      nominalSizeMm: '8',
      insideDiameterMm: 7.9,
      lengthMm: 164,
      depthMm: NaN,
    });
    expect(result.success).toBe(true);
    expect(result.data).toMatchObject({
      toAccessPointId: null,
      nominalSizeMm: 203,
      insideDiameterMm: 200.7,
      lengthMm: 49987,
      depthMm: null,
    });
  });

  it('reports blank or implausible sizes on the field the user typed them in', () => {
    const result = segmentFormSchema('metric').safeParse({
      ...ids,
      label: 'A',
      material: 'pvc',
      nominalSizeMm: 150,
      insideDiameterMm: 6,
      lengthMm: '',
      depthMm: '',
    });
    expect(result.success).toBe(false);
    const paths = result.error!.issues.map((issue) => issue.path.join('.'));
    expect(paths).toEqual(expect.arrayContaining(['lengthMm']));
    // The ID check needs every number: with the length blank the pipe stops before it.
    const odd = segmentFormSchema('metric').safeParse({
      ...ids,
      label: 'A',
      material: 'pvc',
      nominalSizeMm: 150,
      insideDiameterMm: 6,
      lengthMm: 10,
      depthMm: '',
    });
    expect(odd.error!.issues.map((issue) => issue.path.join('.'))).toEqual(['insideDiameterMm']);
  });
});
