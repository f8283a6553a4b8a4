'use client';

import { useRouter } from 'next/navigation';
import { useTranslations } from 'next-intl';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import type { Locale } from '@/i18n/locales';
import { submitJson } from '@/lib/client/submit-json';

const CHOICES = ['', 'en', 'es'] as const;

/** The language setting: English, Spanish, or whatever the browser asks for (stored as null). */
export function ProfileForm({ locale, browserLocale }: { locale: Locale | null; browserLocale: Locale }) {
  const t = useTranslations('profile');
  const tc = useTranslations('common');
  const router = useRouter();
  const [choice, setChoice] = useState<string>(locale ?? '');
  const [status, setStatus] = useState<{ ok: boolean; text: string } | null>(null);
  const [pending, setPending] = useState(false);

  const save = async (event: React.FormEvent) => {
    event.preventDefault();
    setPending(true);
    setStatus(null);
    const result = await submitJson('/api/profile', 'PATCH', { locale: choice === '' ? null : choice }).catch(
      () => null,
    );
    setPending(false);
    if (!result || !result.ok)
      return setStatus({ ok: false, text: t('failed', { message: result?.error.message ?? '—' }) });
    setStatus({ ok: true, text: t('saved') });
    // The next render reads the new setting (i18n/request.ts).
    router.refresh();
  };

  return (
    <form onSubmit={save} className="space-y-4 rounded-lg bg-white p-4 ring-1 ring-slate-200">
      <fieldset>
        <legend className="text-lg font-semibold">{t('language')}</legend>
        {CHOICES.map((value) => (
          <label key={value} className="mt-2 flex min-h-touch cursor-pointer items-center gap-3 text-lg">
            <input
              type="radio"
              name="locale"
              value={value}
              checked={choice === value}
              onChange={() => setChoice(value)}
              className="h-6 w-6 accent-brand-700"
            />
            {value === '' ? t('browser', { current: t(`languages.${browserLocale}`) }) : t(`languages.${value}`)}
          </label>
        ))}
      </fieldset>
      <div role="status" aria-live="polite">
        {status && <p className={status.ok ? 'text-safe-700' : 'text-missed-700'}>{status.text}</p>}
      </div>
      <Button type="submit" size="field" disabled={pending}>
        {pending ? tc('saving') : tc('save')}
      </Button>
    </form>
  );
}
