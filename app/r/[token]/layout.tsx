import type { Metadata } from 'next';
import { headers } from 'next/headers';
import type { ReactNode } from 'react';
import { localeFromAcceptLanguage } from '@/i18n/locales';
import { translatorFor } from '@/i18n/translator';
import { RefusedLinkProvider } from '@/components/report/refused-link';
import { refusalCompanyName, refusedLinkText } from '@/lib/report/link-access';

// Outside the desk and field shells: the customer has no account. The layout learns, from a
// genuine, unrevoked token only, which company to name should the page turn the link away.
export const metadata: Metadata = {
  title: 'Repair report',
  robots: { index: false, follow: false },
  referrer: 'no-referrer',
};

export default async function Layout({
  children,
  params,
}: {
  children: ReactNode;
  params: Promise<{ token: string }>;
}) {
  const companyName = await refusalCompanyName((await params).token);
  // A refused link tells nothing of the customer, so its words follow the browser's language.
  const acceptLanguage = (await headers()).get('accept-language');
  const words = {
    title: translatorFor(localeFromAcceptLanguage(acceptLanguage), 'report')('refused.title'),
    text: refusedLinkText(companyName, acceptLanguage),
  };
  return (
    <main className="min-h-screen bg-slate-50">
      <RefusedLinkProvider words={words}>{children}</RefusedLinkProvider>
    </main>
  );
}
