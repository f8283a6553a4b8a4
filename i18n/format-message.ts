import type { LibMessage, MessageValue } from '@/lib/i18n/message';
import { minutesToText } from '@/lib/cure/resin-clock';
import { formatDateTimeIn, formatDay } from '@/lib/time/dates-locale';
import { formatDuration, formatLength, formatPressure, formatTemperature, type UnitSystem } from '@/lib/units';

/** A translator of the `lib` namespace (useTranslations('lib'), getTranslations('lib'), translatorFor(l, 'lib')). */
type LibTranslator = (key: string, values?: Record<string, string | number>) => string;

export type MessageContext = {
  locale: string;
  system: UnitSystem;
  /** The company's zone for instants; without it they stay UTC ISO (English) or are written in UTC. */
  timeZone?: string;
};

/**
 * A message from pure code (lib/i18n/message.ts) in the reader's language: its quantities written with the
 * reader's decimal separator in the company's units, instants in the company's zone, nested messages first.
 */
export function formatMessage(translator: object, msg: LibMessage, context: MessageContext): string {
  const t = translator as LibTranslator;
  const values: Record<string, string | number> = {};
  for (const [name, value] of Object.entries(msg.values ?? {})) values[name] = valueText(t, value, context);
  return t(msg.key, values);
}

/** The sentences of a flag or a list of reasons, joined as lib/cure joins its English. */
export function formatMessages(translator: object, messages: readonly LibMessage[], context: MessageContext): string {
  return messages.map((m) => formatMessage(translator, m, context)).join(' ');
}

function valueText(t: LibTranslator, value: MessageValue, context: MessageContext): string | number {
  if (typeof value === 'string' || typeof value === 'number') return value;
  const { locale, system, timeZone } = context;
  const english = locale === 'en';
  if ('key' in value) return formatMessage(t, value, context);
  if ('temperatureC' in value) return formatTemperature(value.temperatureC, system, english ? {} : { locale });
  if ('pressureKpa' in value) return formatPressure(value.pressureKpa, system, english ? {} : { locale });
  if ('lengthMm' in value) {
    const decimals = value.decimals === undefined ? {} : { decimals: value.decimals };
    return formatLength(value.lengthMm, system, 'short', english ? decimals : { ...decimals, locale });
  }
  if ('seconds' in value) return formatDuration(value.seconds);
  if ('percent' in value) return String(value.percent);
  if ('minutes' in value) return english ? minutesToText(value.minutes) : minutesIn(value.minutes, locale);
  if ('day' in value) return formatDay(value.day, locale);
  if (english && !timeZone) return value.instant;
  return formatDateTimeIn(value.instant, timeZone ?? 'UTC', english ? undefined : locale);
}

/** Minutes to a tenth, with the reader's decimal separator ("12,5 min"). */
const minutesIn = (minutes: number, locale: string) =>
  `${new Intl.NumberFormat(locale, { maximumFractionDigits: 1, useGrouping: false }).format(Math.round(minutes * 10) / 10)} min`;
