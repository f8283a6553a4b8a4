import type { Metadata } from 'next';
import { getTranslations } from 'next-intl/server';
import { Suspense } from 'react';
import { Logo } from '@/components/shell/logo';
import { siteConfig } from '@/config/site';
import { SignInForm, type SignInWords } from './sign-in-form';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('signIn'))('metaTitle') };
}

const WORDS = ['email', 'password', 'submit', 'submitting', 'badCredentials', 'failed'] as const;
const ERRORS = ['email', 'passwordMissing', 'passwordTooLong'] as const;
// A number no message holds (and none writes with a group separator, as ICU would write 987,654), swapped for
// `{minutes}` so the form fills in the count itself.
const MARK = 99;

export default async function Page() {
  const t = await getTranslations('signIn');
  const words: SignInWords = {
    ...(Object.fromEntries(WORDS.map((key) => [key, t(key)])) as Record<(typeof WORDS)[number], string>),
    tooManyOne: t('tooMany', { minutes: 1 }),
    tooManyOther: t('tooMany', { minutes: MARK }).replace(String(MARK), '{minutes}'),
    errors: Object.fromEntries(ERRORS.map((key) => [key, t(`errors.${key}`)])) as SignInWords['errors'],
  };
  return (
    <main className="flex min-h-screen items-center justify-center bg-slate-900 p-4">
      <div className="w-full max-w-md rounded-xl bg-white p-8 shadow-xl">
        <div className="mb-6 flex items-center gap-3 text-brand-700">
          <Logo className="h-10 w-10" />
          <div>
            <h1 className="text-2xl font-bold text-slate-900">{siteConfig.name}</h1>
            <p className="text-sm text-slate-600">{t('subtitle')}</p>
          </div>
        </div>
        <Suspense>
          <SignInForm words={words} />
        </Suspense>
      </div>
    </main>
  );
}
