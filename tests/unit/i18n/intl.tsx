import { NextIntlClientProvider } from 'next-intl';
import type { ReactNode } from 'react';
import en from '@/messages/en.json';
import es from '@/messages/es.json';

/** Wraps a component under test in the app's message catalogue, as the pages' IntlScope does. */
export function IntlWrapper({ children, locale = 'en' }: { children: ReactNode; locale?: 'en' | 'es' }) {
  return (
    <NextIntlClientProvider locale={locale} messages={locale === 'es' ? es : en} timeZone="UTC">
      {children}
    </NextIntlClientProvider>
  );
}
