import type { Metadata } from 'next';
import type { ReactNode } from 'react';
import { RefusedLinkProvider } from '@/components/report/refused-link';
import { companyNameOf } from '@/lib/report/data';
import { verifyReportLink } from '@/lib/report/link';

// Outside the desk and field shells: the customer has no account. The layout learns, from a
// genuine token only, which company to name should the page turn the link away.
export const metadata: Metadata = { title: 'Repair report', robots: { index: false, follow: false }, referrer: 'no-referrer' };

export default async function Layout({ children, params }: { children: ReactNode; params: Promise<{ token: string }> }) {
  const check = verifyReportLink((await params).token);
  const companyName = check.ok || check.reason === 'expired' ? await companyNameOf(check.companyId) : null;
  return (
    <main className="min-h-screen bg-slate-50">
      <RefusedLinkProvider companyName={companyName}>{children}</RefusedLinkProvider>
    </main>
  );
}
