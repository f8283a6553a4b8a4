import { notFound } from 'next/navigation';
import { CustomerInvoice } from '@/components/invoice/customer-invoice';
import { ReportView } from '@/components/report/report-view';
import { openReportLink } from '@/lib/report/link-access';

// The customer's read-only report behind a signed, expiring link (no account). A refused link
// answers 404 with the same page whatever the reason (see not-found.tsx).
export const dynamic = 'force-dynamic';

export default async function Page({
  params,
  searchParams,
}: {
  params: Promise<{ token: string }>;
  searchParams: Promise<{ paid?: string }>;
}) {
  const { token } = await params;
  const access = await openReportLink(token);
  if (!access.ok) notFound();
  const justPaid = (await searchParams).paid === '1';
  return (
    <ReportView
      data={access.data}
      pdfHref={`/r/${encodeURIComponent(token)}/pdf`}
      invoiceSlot={
        <CustomerInvoice
          companyId={access.claims.companyId}
          jobId={access.claims.jobId}
          token={token}
          justPaid={justPaid}
        />
      }
    />
  );
}
