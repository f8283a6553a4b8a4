import type { Metadata } from 'next';
import { cookies, headers } from 'next/headers';
import { redirect } from 'next/navigation';
import { localeFromAcceptLanguage } from '@/i18n/locales';
import { translatorFor } from '@/i18n/translator';
import { checkLiveLink } from '@/lib/report/link-access';
import { RETURN_COOKIE } from '@/lib/report/payment-return';

// Where the payment provider sends the customer back (it never sees the report token). With the cookie
// "Pay now" left in this browser for this very link, the customer lands on the report again; anyone else
// gets a plain page that says nothing about the report or the job.
export const dynamic = 'force-dynamic';
export const metadata: Metadata = {
  title: 'Payment',
  robots: { index: false, follow: false },
  referrer: 'no-referrer',
};

export default async function Page({
  params,
  searchParams,
}: {
  params: Promise<{ linkId: string }>;
  searchParams: Promise<{ paid?: string }>;
}) {
  const { linkId } = await params;
  const paid = (await searchParams).paid === '1';
  const token = (await cookies()).get(RETURN_COOKIE)?.value;
  if (token) {
    const check = await checkLiveLink(token);
    if (check.ok && check.linkId === linkId) redirect(`/r/${encodeURIComponent(token)}${paid ? '?paid=1' : ''}`);
  }
  // Nothing here names the customer, so the page speaks the browser's language.
  const t = translatorFor(localeFromAcceptLanguage((await headers()).get('accept-language')), 'report');
  return (
    <main className="min-h-screen bg-slate-50">
      <div className="mx-auto max-w-lg p-8 text-center">
        <h1 className="text-2xl font-bold">{paid ? t('payBack.paidTitle') : t('payBack.notPaidTitle')}</h1>
        <p className="mt-3 text-slate-700">{paid ? t('payBack.paidText') : t('payBack.notPaidText')}</p>
      </div>
    </main>
  );
}
