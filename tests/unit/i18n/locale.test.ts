import { describe, expect, it } from 'vitest';
import { isLocale, localeFromAcceptLanguage } from '@/i18n/locales';
import { formatDateTimeIn, formatDay } from '@/lib/time/dates-locale';
import { formatLength, formatNumber, formatPressure, formatTemperature } from '@/lib/units';

describe('localeFromAcceptLanguage', () => {
  it('takes the first language we speak, by weight, regional tags counting for their language', () => {
    expect(localeFromAcceptLanguage('es')).toBe('es');
    expect(localeFromAcceptLanguage('es-MX,es;q=0.9,en;q=0.8')).toBe('es');
    expect(localeFromAcceptLanguage('fr-FR,fr;q=0.9,es;q=0.7,en;q=0.5')).toBe('es');
    expect(localeFromAcceptLanguage('en;q=0.4, es;q=0.8')).toBe('es');
    expect(localeFromAcceptLanguage('en-US,en;q=0.9')).toBe('en');
  });

  it('falls back to English for nothing, nonsense or only languages we lack', () => {
    expect(localeFromAcceptLanguage(null)).toBe('en');
    expect(localeFromAcceptLanguage('')).toBe('en');
    expect(localeFromAcceptLanguage('de-DE,fr;q=0.5')).toBe('en');
    expect(localeFromAcceptLanguage('es;q=0')).toBe('en');
    expect(localeFromAcceptLanguage(';;;,=q')).toBe('en');
  });

  it('knows its locales', () => {
    expect(isLocale('es')).toBe(true);
    expect(isLocale('ES')).toBe(false);
    expect(isLocale(undefined)).toBe(false);
  });
});

describe('numbers, units and dates per locale', () => {
  it('writes the decimal comma in Spanish and leaves English as it was', () => {
    expect(formatNumber(35.83, 1)).toBe('35.8');
    expect(formatNumber(35.83, 1, 'es')).toBe('35,8');
    expect(formatNumber(-0.01, 1, 'es')).toBe('0,0');
    // 910 mm = 35.83 in (910 / 25.4); 103.4 kPa = 15.0 psi (1 psi = 6.894757 kPa)
    expect(formatLength(910, 'imperial', 'short', { locale: 'es' })).toBe('35,8 in');
    expect(formatPressure(103.4, 'imperial', { locale: 'es' })).toBe('15,0 psi');
    expect(formatTemperature(14, 'metric', { locale: 'es' })).toBe('14 °C');
    expect(formatLength(12_345_000, 'metric', 'long', { locale: 'es' })).toBe('12.345,00 m');
  });

  it('writes dates with Spanish month names, in the given zone', () => {
    expect(formatDay('2026-12-31', 'es')).toBe('31 dic 2026');
    expect(formatDay('2026-12-31')).toBe('2026-12-31');
    const at = new Date('2026-12-02T21:05:00Z');
    expect(formatDateTimeIn(at, 'America/Denver', 'es')).toMatch(/^2 dic 2026, 14:05 /);
    expect(formatDateTimeIn(at, 'America/Denver')).toMatch(/^2026-12-02 14:05 /);
  });
});
