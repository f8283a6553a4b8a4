import type { Metadata } from 'next';
import type { ReactNode } from 'react';
import { RefusedLinkProvider } from '@/components/report/refused-link';
import { refusalCompanyName } from '@/lib/report/link-access';

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
  return (
    <main className="min-h-screen bg-slate-50">
      <RefusedLinkProvider companyName={companyName}>{children}</RefusedLinkProvider>
    </main>
  );
}
