import fc from 'fast-check';
import { createTranslator } from 'next-intl';
import { describe, expect, it } from 'vitest';
import { flagsFor, planCure } from '@/lib/cure';
import { formatMessage, formatMessages, type MessageContext } from '@/i18n/format-message';
import { localisedFlags } from '@/lib/review/flags';
import en from '@/messages/en.json';
import es from '@/messages/es.json';
import { cleanInstall, plusMin, typicalEpoxy } from '../cure/fixtures';

// lib/cure writes each sentence twice: English text for the API and the desk, and a catalogue message for the
// screens. The English catalogue must give back the English text exactly, whatever the inputs; Spanish gets the
// same facts with its own words, decimal comma and dates.

const tEn = createTranslator({ locale: 'en', messages: en, namespace: 'lib' });
const tEs = createTranslator({ locale: 'es', messages: es, namespace: 'lib' });
const metric: MessageContext = { locale: 'en', system: 'metric' };

const clean = cleanInstall;
const { mixedAt } = cleanInstall;

const temperature = fc.integer({ min: -100, max: 600 }).map((t) => t / 10);
const record = fc.record({
  mixTempC: temperature,
  airTempC: fc.option(temperature, { nil: undefined }),
  pipeTempC: temperature,
  inflateMin: fc.option(fc.integer({ min: 1, max: 90 }), { nil: undefined }),
  holdMin: fc.integer({ min: 1, max: 400 }),
  dryRunSeconds: fc.option(fc.integer({ min: 0, max: 3600 }), { nil: undefined }),
  prepMinutes: fc.option(
    fc.integer({ min: 0, max: 600 }).map((m) => m / 10),
    { nil: undefined },
  ),
  holdReserve: fc.constantFrom(0, 0.1, 0.25),
  pressures: fc.array(fc.integer({ min: 0, max: 400 }), { maxLength: 4 }),
  expires: fc.constantFrom('2025-06-01', '2025-06-02', '2025-12-31'),
  mixed: fc.boolean(),
  system: fc.constantFrom('metric' as const, 'imperial' as const),
});

describe('lib messages in English read exactly as lib/cure’s English', () => {
  it('for every GO / NO-GO reason and the counted line', () => {
    fc.assert(
      fc.property(record, (r) => {
        const plan = planCure(typicalEpoxy, {
          mixedAt,
          mixTempC: r.mixTempC,
          airTempC: r.airTempC,
          pipeTempC: r.pipeTempC,
          dryRunSeconds: r.dryRunSeconds,
          prepMinutes: r.prepMinutes,
          unitSystem: r.system,
        });
        const context = { locale: 'en', system: r.system };
        expect(plan.reasonDetails.map((m) => formatMessage(tEn, m, context))).toEqual(plan.reasons);
        expect(formatMessage(tEn, plan.countedDetail, context)).toBe(plan.counted);
      }),
      { numRuns: 300 },
    );
  });

  it('for every flag, and with the instants in the company’s zone as the desk writes them', () => {
    fc.assert(
      fc.property(record, (r) => {
        const inflatedAt = r.inflateMin === undefined ? undefined : plusMin(mixedAt, r.inflateMin);
        const flags = flagsFor({
          ...clean,
          mixedAt: r.mixed ? mixedAt : undefined,
          now: plusMin(mixedAt, 45),
          mixTempC: r.mixTempC,
          airTempC: r.airTempC,
          pipeTempC: r.pipeTempC,
          inflatedAt: r.mixed ? inflatedAt : undefined,
          deflatedAt: r.mixed && inflatedAt ? plusMin(inflatedAt, r.holdMin) : undefined,
          dryRunSeconds: r.dryRunSeconds,
          prepMinutes: r.prepMinutes,
          holdReserve: r.holdReserve,
          makerHoldMin: 120,
          pressuresKpa: r.pressures,
          resinKitExpiresOn: r.expires,
          unitSystem: r.system,
        });
        for (const flag of flags) {
          expect(formatMessages(tEn, flag.details ?? [], { locale: 'en', system: r.system })).toBe(flag.message);
        }
        const zone = 'America/Denver';
        const desk = localisedFlags(flags, zone);
        flags.forEach((flag, i) => {
          const context = { locale: 'en', system: r.system, timeZone: zone };
          expect(formatMessages(tEn, flag.details ?? [], context)).toBe(desk[i].message);
        });
      }),
      { numRuns: 300 },
    );
  });

  it('can fail: a changed value changes the sentence', () => {
    const [flag] = flagsFor({ ...clean, pipeTempC: 41 });
    const changed = { ...flag.details![0], values: { ...flag.details![0].values, temp: { temperatureC: 42 } } };
    expect(formatMessage(tEn, changed, metric)).not.toBe(flag.message);
  });
});

describe('lib messages in Spanish', () => {
  const imperial: MessageContext = { locale: 'es', system: 'imperial', timeZone: 'America/Denver' };

  it('writes a NO-GO reason with Spanish words, the decimal comma and the company’s units', () => {
    const plan = planCure(typicalEpoxy, { mixedAt, mixTempC: 20, pipeTempC: 2.5, unitSystem: 'imperial' });
    const spanish = plan.reasonDetails.map((m) => formatMessage(tEs, m, imperial));
    expect(spanish[0]).toBe(
      'La tubería a 37 °F está más fría que el mínimo de esta resina, 41 °F: puede que no cure. ' +
        'Use una resina apta para la temperatura de la tubería.',
    );
    expect(spanish).toContain(
      'No se registró prueba en seco: tire una vez del empacador vacío hasta el daño y cronométrelo antes de ' +
        'mezclar; una cuadrilla cuidadosa no sigue sin ella.',
    );
  });

  it('writes the counted line with minutes to a tenth and a decimal comma', () => {
    const plan = planCure(typicalEpoxy, {
      mixedAt,
      mixTempC: 18,
      airTempC: 21,
      pipeTempC: 20,
      dryRunSeconds: 330,
      prepMinutes: 6.5,
    });
    expect(formatMessage(tEs, plan.countedDetail, { locale: 'es', system: 'metric' })).toBe(
      'Contado: 6,5 min desde la mezcla hasta tener el parche en el empacador + el tirón de la prueba en seco, ' +
        '0:05:30 = 12 min; el tiempo de trabajo de 28 min a 21 °C, la más caliente de resina (18 °C) y aire ' +
        '(21 °C), menos la reserva del 20 %, deja 22,4 min.',
    );
  });

  it('writes flag details with dates in Spanish in the company’s zone', () => {
    const flags = flagsFor({
      ...clean,
      inflatedAt: plusMin(mixedAt, 31),
      deflatedAt: plusMin(mixedAt, 200),
      pressuresKpa: [150, 210.5],
      resinKitExpiresOn: '2025-06-01',
    });
    const text = Object.fromEntries(flags.map((f) => [f.kind, formatMessages(tEs, f.details ?? [], imperial)]));
    expect(text['late-inflate']).toBe(
      'Inflado el 2 jun 2025, 02:31 GMT-6, después de la hora límite para inflar (2 jun 2025, 02:30 GMT-6): ' +
        'puede que la resina empezara a fraguar antes de apretar el parche.',
    );
    expect(text['pressure-out-of-range']).toBe(
      '1 de 2 lecturas de presión fuera del rango del empacador, 14,5 psi–29,0 psi (lecturas de 21,8 psi a 30,5 psi).',
    );
    expect(text['expired-resin']).toBe('El kit de resina caducó el 1 jun 2025, antes de mezclarse el 2 jun 2025.');
  });
});
