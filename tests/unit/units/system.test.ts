import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  UnitInputError,
  lengthFromSi,
  lengthToSi,
  pressureFromSi,
  pressureToSi,
  temperatureFromSi,
  temperatureToSi,
  unitLabels,
  volumeFromSi,
  volumeToSi,
  convertLength,
  convertPressure,
  convertVolume,
  convertTemperature,
  type UnitSystem,
} from '@/lib/units';

const systems: UnitSystem[] = ['metric', 'imperial'];
const finite = fc.double({ min: -1e9, max: 1e9, noNaN: true });
// Relative tolerance: float rounding grows with magnitude.
const near = (a: number, b: number) => expect(Math.abs(a - b)).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(b)));

describe('unit system helpers', () => {
  it('pick the unit per system and length kind', () => {
    expect(lengthToSi(6, 'imperial', 'short')).toBeCloseTo(152.4, 10);
    expect(lengthToSi(150, 'metric', 'short')).toBe(150);
    expect(lengthToSi(10, 'imperial', 'long')).toBeCloseTo(3048, 10);
    expect(lengthToSi(2.5, 'metric', 'long')).toBe(2500);
    expect(lengthFromSi(304.8, 'imperial', 'long')).toBeCloseTo(1, 12);
    expect(lengthFromSi(25.4, 'imperial')).toBeCloseTo(1, 12);
    expect(pressureToSi(1, 'imperial')).toBe(6.894757);
    expect(pressureFromSi(150, 'metric')).toBe(150);
    expect(temperatureToSi(50, 'imperial')).toBeCloseTo(10, 12);
    expect(temperatureFromSi(20, 'imperial')).toBeCloseTo(68, 12);
    expect(volumeFromSi(3.785411784, 'imperial')).toBeCloseTo(1, 12);
    expect(volumeToSi(2, 'metric')).toBe(2);
  });

  it('labels each system', () => {
    expect(unitLabels('metric')).toEqual({
      shortLength: 'mm',
      longLength: 'm',
      pressure: 'kPa',
      temperature: '°C',
      volume: 'L',
      force: 'kN',
    });
    expect(unitLabels('imperial')).toEqual({
      shortLength: 'in',
      longLength: 'ft',
      pressure: 'psi',
      temperature: '°F',
      volume: 'US gal',
      force: 'lbf',
    });
    expect(() => unitLabels('nautical' as never)).toThrow(UnitInputError);
  });

  it('round-trips every quantity through SI', () => {
    fc.assert(
      fc.property(
        finite,
        fc.constantFrom(...systems),
        fc.constantFrom('short' as const, 'long' as const),
        (v, system, kind) => {
          near(lengthFromSi(lengthToSi(v, system, kind), system, kind), v);
          near(pressureFromSi(pressureToSi(v, system), system), v);
          near(volumeFromSi(volumeToSi(v, system), system), v);
        },
      ),
    );
    fc.assert(
      fc.property(fc.double({ min: -200, max: 1000, noNaN: true }), fc.constantFrom(...systems), (c, system) => {
        expect(temperatureToSi(temperatureFromSi(c, system), system)).toBeCloseTo(c, 9);
      }),
    );
  });

  it('rejects non-finite input with UnitInputError', () => {
    for (const bad of [NaN, Infinity, -Infinity, '3' as unknown as number, undefined as unknown as number]) {
      expect(() => convertLength(bad, 'mm', 'in')).toThrow(UnitInputError);
      expect(() => convertPressure(bad, 'kPa', 'psi')).toThrow(UnitInputError);
      expect(() => convertVolume(bad, 'L', 'US gal')).toThrow(UnitInputError);
      expect(() => convertTemperature(bad, '°C', '°F')).toThrow(UnitInputError);
      expect(() => lengthToSi(bad, 'imperial', 'short')).toThrow(UnitInputError);
    }
  });

  it('rejects temperatures below absolute zero', () => {
    expect(() => convertTemperature(-300, '°C', '°F')).toThrow(UnitInputError);
    expect(() => temperatureToSi(-500, 'imperial')).toThrow(UnitInputError);
  });
});
