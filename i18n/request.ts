import { headers } from 'next/headers';
import { getRequestConfig } from 'next-intl/server';
import { cache } from 'react';
import { getSessionClaims } from '@/lib/auth/claims';
import { userFromClaims } from '@/lib/auth/session';
import { isLocale, localeFromAcceptLanguage, type Locale } from './locales';

// next-intl without locale-prefixed routes: the signed-in user's language setting decides, else the browser's
// Accept-Language. A page that must speak someone else's language (the customer's report) asks for it by name
// (`getTranslations({ locale })`), which arrives here as `requestLocale`.
export default getRequestConfig(async ({ requestLocale }) => {
  const requested = await requestLocale;
  const locale = isLocale(requested) ? requested : await visitorLocale();
  return {
    locale,
    messages: (await import(`../messages/${locale}.json`)).default,
    // Dates are formatted by lib/dates in the company's zone; this only keeps next-intl from guessing one.
    timeZone: 'UTC',
  };
});

/** Once per request: the user's setting, else Accept-Language. */
const visitorLocale = cache(async (): Promise<Locale> => {
  try {
    const user = await userFromClaims(await getSessionClaims());
    if (user?.locale) return user.locale;
  } catch {
    // No database at hand (a build step, an outage): the browser's language still gives a readable page.
  }
  return localeFromAcceptLanguage((await headers()).get('accept-language'));
});
