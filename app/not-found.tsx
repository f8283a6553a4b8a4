import Link from 'next/link';
import { getTranslations } from 'next-intl/server';

export default async function NotFound() {
  const t = await getTranslations('common.notFound');
  return (
    <main className="mx-auto max-w-lg p-8 text-center">
      <h1 className="text-2xl font-bold">{t('title')}</h1>
      <p className="mt-2 text-slate-600">{t('body')}</p>
      <Link href="/" className="mt-6 inline-block font-semibold text-brand-700 underline">
        {t('home')}
      </Link>
    </main>
  );
}
