import 'server-only';
import { formatMessage } from '@/i18n/format-message';
import { localeFromAcceptLanguage, type Locale } from '@/i18n/locales';
import { translatorFor } from '@/i18n/translator';
import type { SessionUser } from '@/lib/auth/session';
import { AppError } from '@/lib/server/errors';

// A route whose refusals a field user reads (the tablet parks a refused tap under "Needs attention" with the
// server's sentence) answers them in that user's language. English keeps the sentence the error was made with,
// byte for byte; so does any error without a catalogue message. The JSON shape is handle()'s, unchanged.

/** The user's language setting, else the browser's Accept-Language (as i18n/request.ts decides for pages). */
export const localeOf = (user: Pick<SessionUser, 'locale'>, request: Request): Locale =>
  user.locale ?? localeFromAcceptLanguage(request.headers.get('accept-language'));

/** Runs `fn`; an AppError it throws with a catalogue message is thrown again in `locale`. */
export async function inLanguage<T>(locale: Locale, fn: () => Promise<T>): Promise<T> {
  try {
    return await fn();
  } catch (error) {
    throw translated(error, locale);
  }
}

export function translated(error: unknown, locale: Locale): unknown {
  if (!(error instanceof AppError) || !error.said || locale === 'en') return error;
  const text = formatMessage(translatorFor(locale, 'lib'), error.said, { locale, system: 'metric' });
  // A field that repeats the sentence (the device time's bound) says it in the same language.
  const fields =
    error.fields &&
    Object.fromEntries(
      Object.entries(error.fields).map(([k, list]) => [k, list.map((m) => (m === error.message ? text : m))]),
    );
  return new AppError(error.status, text, fields, error.said);
}
