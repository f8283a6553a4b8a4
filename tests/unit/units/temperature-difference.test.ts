import { describe, expect, it } from 'vitest';
import {
  temperatureDifferenceFromSi,
  temperatureDifferenceToSi,
  temperatureFromSi,
  temperatureToSi,
  UnitInputError,
} from '@/lib/units';

// NIST SP 811 §4.2.1.1 / App. B.9: t/°F = 1.8·t/°C + 32 for a temperature; an interval of 1 °C = 1.8 °F (no offset).
describe('temperature differences', () => {
  it('scale by 1.8 without the 32 °F offset', () => {
    expect(temperatureDifferenceToSi(18, 'imperial')).toBeCloseTo(10, 12); // the trade's 10 °C = 18 °F doubling step
    expect(temperatureDifferenceFromSi(10, 'imperial')).toBeCloseTo(18, 12);
    expect(temperatureDifferenceToSi(1.8, 'imperial')).toBeCloseTo(1, 12);
    expect(temperatureDifferenceToSi(0, 'imperial')).toBe(0);
    expect(temperatureDifferenceToSi(7, 'metric')).toBe(7);
    expect(temperatureDifferenceFromSi(7, 'metric')).toBe(7);
  });

  it('differ from absolute temperatures, which take the offset', () => {
    expect(temperatureToSi(50, 'imperial')).toBeCloseTo(10, 12); // 50 °F = 10 °C
    expect(temperatureDifferenceToSi(50, 'imperial')).toBeCloseTo(27.7778, 4); // a 50 °F step = 27.78 °C step
    expect(temperatureFromSi(-40, 'imperial')).toBeCloseTo(-40, 12); // −40 is the same on both scales
    expect(temperatureDifferenceFromSi(-40, 'imperial')).toBeCloseTo(-72, 12);
  });

  it('equal the difference of two converted temperatures', () => {
    const [a, b] = [41, 95]; // °F
    expect(temperatureDifferenceToSi(b - a, 'imperial')).toBeCloseTo(
      temperatureToSi(b, 'imperial') - temperatureToSi(a, 'imperial'),
      12,
    );
  });

  it('refuse a value that is not a number', () => {
    expect(() => temperatureDifferenceToSi(Number.NaN, 'imperial')).toThrow(UnitInputError);
  });
});
