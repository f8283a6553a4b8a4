import { describe, expect, it } from 'vitest';
import { KPA_PER_M_WATER, SizingInputError, groundwaterPressureKpa, pressureVerdict } from '@/lib/sizing';
import { PSI_PER_FT_WATER } from '@/lib/design';
import { convertPressure } from '@/lib/units';

describe('groundwaterPressureKpa', () => {
  it('1 m of water is 9.806 65 kPa (NIST SP 811 App. B.8, conventional centimetre of water = 98.0665 Pa)', () => {
    expect(KPA_PER_M_WATER).toBe(9.80665);
    expect(groundwaterPressureKpa(1000)).toBeCloseTo(9.80665, 12);
    expect(groundwaterPressureKpa(0)).toBe(0);
  });

  it('agrees with ASTM F1216 X1’s 0.433 psi per foot within 0.2 %', () => {
    // 10 ft = 3 048 mm → 29.89 kPa = 4.335 psi; F1216: 4.33 psi.
    const psi = convertPressure(groundwaterPressureKpa(3048), 'kPa', 'psi');
    expect(psi).toBeCloseTo(4.335, 3);
    expect(Math.abs(psi / (PSI_PER_FT_WATER * 10) - 1)).toBeLessThan(0.002);
  });

  it('refuses a negative or missing head', () => {
    for (const bad of [-1, NaN]) expect(() => groundwaterPressureKpa(bad)).toThrow(SizingInputError);
  });
});

describe('pressureVerdict — what a gauge reading tells the crew first', () => {
  const rating = { minPressureKpa: 70, maxPressureKpa: 150 };
  it('above the rating: release pressure comes before everything, groundwater or not', () => {
    expect(pressureVerdict(151, rating)).toBe('over_rating');
    expect(pressureVerdict(151, rating, 200)).toBe('over_rating');
  });
  it('at or below a known groundwater pressure warns, before the low end of the rating', () => {
    expect(pressureVerdict(60, rating, 80)).toBe('below_groundwater');
    expect(pressureVerdict(80, rating, 80)).toBe('below_groundwater');
    expect(pressureVerdict(60, rating, null)).toBe('under_rating');
  });
  it('within the rating and above the water is fine, ends included', () => {
    expect(pressureVerdict(70, rating, 30)).toBe('ok');
    expect(pressureVerdict(150, rating)).toBe('ok');
    expect(pressureVerdict(100, null, null)).toBe('ok');
  });
});
