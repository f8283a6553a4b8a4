import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  UnitInputError,
  formatDuration,
  formatForce,
  formatLength,
  formatPressure,
  formatTemperature,
  formatVolume,
  parseDuration,
} from '@/lib/units';

describe('formatDuration', () => {
  it('writes h:mm:ss', () => {
    expect(formatDuration(0)).toBe('0:00:00');
    expect(formatDuration(5400)).toBe('1:30:00');
    expect(formatDuration(59.6)).toBe('0:01:00');
    expect(formatDuration(14_400)).toBe('4:00:00');
    expect(formatDuration(30 * 3600 + 61)).toBe('30:01:01');
  });

  it('marks overdue (negative) durations with a leading minus', () => {
    expect(formatDuration(-90)).toMatch(/^[−-]0:01:30$/);
    expect(formatDuration(-0.2)).toBe('0:00:00');
  });

  it('rejects non-finite seconds', () => {
    expect(() => formatDuration(NaN)).toThrow(UnitInputError);
    expect(() => formatDuration(Infinity)).toThrow(UnitInputError);
  });
});

describe('parseDuration', () => {
  it('reads h:mm:ss', () => {
    expect(parseDuration('1:30:00')).toBe(5400);
    expect(parseDuration(' 0:04:30 ')).toBe(270);
    expect(parseDuration('-0:01:30')).toBe(-90);
    expect(parseDuration('−0:01:30')).toBe(-90);
  });

  it('rejects ambiguous or malformed text', () => {
    for (const bad of ['4:30', '1:60:00', '1:00:60', 'abc', '', '1:3:00', '1.5:00:00']) {
      expect(() => parseDuration(bad)).toThrow(UnitInputError);
    }
  });

  it('round-trips whole seconds', () => {
    fc.assert(
      fc.property(fc.integer({ min: -10_000_000, max: 10_000_000 }), (s) => {
        expect(parseDuration(formatDuration(s))).toBe(s);
      }),
    );
  });
});

describe('quantity formatting', () => {
  it('labels lengths per system and kind', () => {
    expect(formatLength(150, 'metric')).toBe('150 mm');
    expect(formatLength(152.4, 'imperial')).toBe('6.0 in');
    expect(formatLength(1500, 'metric', 'long')).toBe('1.50 m');
    expect(formatLength(3048, 'imperial', 'long')).toBe('10.0 ft');
    expect(formatLength(150, 'metric', 'short', { decimals: 1 })).toBe('150.0 mm');
  });

  it('labels pressure, temperature, volume and force', () => {
    expect(formatPressure(150, 'metric')).toBe('150 kPa');
    expect(formatPressure(6.894757 * 20, 'imperial')).toBe('20.0 psi');
    expect(formatTemperature(20, 'metric')).toBe('20 °C');
    expect(formatTemperature(20, 'imperial')).toBe('68 °F');
    expect(formatVolume(1.5, 'metric')).toBe('1.50 L');
    expect(formatVolume(3.785411784, 'imperial')).toBe('1.00 US gal');
    expect(formatForce(2650.7, 'metric')).toBe('2.7 kN');
    expect(formatForce(2650.7, 'imperial')).toBe('596 lbf');
  });

  it('never writes "-0"', () => {
    expect(formatTemperature(-0.2, 'metric')).toBe('0 °C');
  });
});
