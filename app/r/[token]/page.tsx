import { notFound } from 'next/navigation';
import { ReportView } from '@/components/report/report-view';
import { openReportLink } from '@/lib/report/link-access';

// The customer's read-only report behind a signed, expiring link (no account). A refused link
// answers 404 with the same page whatever the reason (see not-found.tsx).
export const dynamic = 'force-dynamic';

export default async function Page({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const access = await openReportLink(token);
  if (!access.ok) notFound();
  return (
    <ReportView
      data={access.data}
      pdfHref={`/r/${encodeURIComponent(token)}/pdf`}
      // INVOICE SLOT: the job's invoice and its pay link go here once invoicing lands.
      invoiceSlot={null}
    />
  );
}
