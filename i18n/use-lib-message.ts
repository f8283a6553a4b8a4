import { useLocale, useTranslations } from 'next-intl';
import { useCallback } from 'react';
import type { LibMessage } from '@/lib/i18n/message';
import type { UnitSystem } from '@/lib/units';
import { formatMessages } from './format-message';

/**
 * In a client component under an IntlScope holding `lib`: writes pure code's messages (GO / NO-GO reasons, flag
 * details) in the reader's language, in the company's units and time zone.
 */
export function useLibMessage(system: UnitSystem, timeZone?: string) {
  const t = useTranslations('lib');
  const locale = useLocale();
  return useCallback(
    (messages: LibMessage | readonly LibMessage[]) =>
      formatMessages(t, Array.isArray(messages) ? messages : [messages as LibMessage], { locale, system, timeZone }),
    [t, locale, system, timeZone],
  );
}
