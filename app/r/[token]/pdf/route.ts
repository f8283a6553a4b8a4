import { handle } from '@/lib/http';
import { openReportLink, refusedLinkText } from '@/lib/report/link-access';
import { renderReportPdf, reportFileName } from '@/lib/report/pdf';

/** The report PDF behind a customer link; 404 for a bad link, 410 for an expired genuine one. */
export const GET = handle(async (_request: Request, { params }: { params: Promise<{ token: string }> }) => {
  const access = await openReportLink((await params).token);
  if (!access.ok) {
    return new Response(refusedLinkText(access.companyName), {
      status: access.status,
      headers: { 'content-type': 'text/plain; charset=utf-8', 'cache-control': 'no-store' },
    });
  }
  const pdf = await renderReportPdf(access.data);
  return new Response(new Uint8Array(pdf), {
    headers: {
      'content-type': 'application/pdf',
      'content-disposition': `attachment; filename="${reportFileName(access.data.job.number)}"`,
      'cache-control': 'private, no-store',
      'referrer-policy': 'no-referrer',
    },
  });
});
