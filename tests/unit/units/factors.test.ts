import { describe, expect, it } from 'vitest';
import { convertForce, convertLength, convertPressure, convertTemperature, convertVolume } from '@/lib/units';

// Check values from NIST Special Publication 811 (2008), Appendix B.
describe('conversion factors (NIST SP 811)', () => {
  it('1 in = 25.4 mm exactly', () => {
    expect(convertLength(1, 'in', 'mm')).toBe(25.4);
  });

  it('1 ft = 0.3048 m exactly', () => {
    expect(convertLength(1, 'ft', 'm')).toBeCloseTo(0.3048, 12);
    expect(convertLength(1, 'ft', 'mm')).toBe(304.8);
  });

  it('1 psi = 6.894757 kPa', () => {
    expect(convertPressure(1, 'psi', 'kPa')).toBe(6.894757);
  });

  it('1 bar = 100 kPa exactly', () => {
    expect(convertPressure(1, 'bar', 'kPa')).toBe(100);
  });

  it('1 US gal = 3.785411784 L exactly', () => {
    expect(convertVolume(1, 'US gal', 'L')).toBe(3.785411784);
  });

  it('°F = °C × 9/5 + 32', () => {
    expect(convertTemperature(0, '°C', '°F')).toBe(32);
    expect(convertTemperature(100, '°C', '°F')).toBe(212);
    expect(convertTemperature(-40, '°C', '°F')).toBe(-40);
    expect(convertTemperature(68, '°F', '°C')).toBeCloseTo(20, 12);
  });

  it('1 lbf = 4.448222 N (to the 7 digits SP 811 lists)', () => {
    expect(convertForce(1, 'lbf', 'N')).toBeCloseTo(4.448222, 6);
  });
});

describe('unit names', () => {
  it('accepts common spellings', () => {
    expect(convertTemperature(100, 'C' as never, 'F' as never)).toBe(212);
    expect(convertVolume(1, 'gal' as never, 'l' as never)).toBe(3.785411784);
    expect(convertPressure(1, 'bar', 'kpa' as never)).toBe(100);
  });

  it('rejects unknown units, including inherited object keys', () => {
    expect(() => convertLength(1, 'yd' as never, 'mm')).toThrow(/Unknown length unit/);
    expect(() => convertLength(1, 'constructor' as never, 'mm')).toThrow(/Unknown length unit/);
    expect(() => convertPressure(1, 'toString' as never, 'kPa')).toThrow(/Unknown pressure unit/);
  });
});
