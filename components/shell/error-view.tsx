'use client';

import { useTranslations } from 'next-intl';
import type { ErrorWords } from './error-words';

/** The English of the page, should no words be handed down (a failure above the root layout's provider). */
const ENGLISH: ErrorWords = {
  title: 'Something went wrong',
  body: 'Nothing you entered was lost. Try again; if it keeps happening, tell your office.',
  retry: 'Try again',
};

/** The friendly failure page of every section: says nothing was lost, offers a retry, shows no internals. */
export function ErrorView({ reset, words = ENGLISH }: { reset: () => void; words?: ErrorWords }) {
  return (
    <main className="mx-auto max-w-lg p-8 text-center">
      <h1 className="text-2xl font-bold">{words.title}</h1>
      <p className="mt-2 text-slate-600">{words.body}</p>
      <button type="button" onClick={reset} className="mt-6 rounded-md bg-brand-700 px-4 py-2 font-semibold text-white">
        {words.retry}
      </button>
    </main>
  );
}

/** The same page in the reader's language, for a section whose layout hands its children the `common` words. */
export function SectionErrorView({ reset }: { reset: () => void }) {
  const t = useTranslations('common.error');
  return <ErrorView reset={reset} words={{ title: t('title'), body: t('body'), retry: t('retry') }} />;
}
