import 'server-only';
import { createTranslator } from 'next-intl';
import en from '@/messages/en.json';
import es from '@/messages/es.json';
import type { Locale } from './locales';

// Translation outside a page request (the report worker's e-mail and PDF, the customer's report in the customer's
// language): the same catalogues, picked by an explicit locale rather than the visitor's.
const CATALOGUES: Record<Locale, typeof en> = { en, es };

export function translatorFor<const N extends keyof typeof en>(locale: Locale, namespace: N) {
  return createTranslator({ locale, messages: CATALOGUES[locale], namespace });
}
