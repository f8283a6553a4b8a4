import { handle } from '@/lib/server/http';
import { openReportLink, refusedLinkText } from '@/lib/report/link-access';
import { cachedReportPdf, reportFileName } from '@/lib/report/pdf-cache';

/**
 * The report PDF behind a customer link; 404 for a bad or revoked link, 410 for an expired genuine one.
 * Served from the per-version cache (lib/report/pdf-cache): rendered once per report version, not per hit.
 */
export const GET = handle(async (request: Request, { params }: { params: Promise<{ token: string }> }) => {
  const access = await openReportLink((await params).token, { images: false });
  if (!access.ok) {
    return new Response(refusedLinkText(access.companyName, request.headers.get('accept-language')), {
      status: access.status,
      headers: { 'content-type': 'text/plain; charset=utf-8', 'cache-control': 'no-store' },
    });
  }
  const pdf = await cachedReportPdf(access.claims.companyId, access.claims.jobId);
  return new Response(new Uint8Array(pdf), {
    headers: {
      'content-type': 'application/pdf',
      'content-disposition': `attachment; filename="${reportFileName(access.data.job.number)}"`,
      'cache-control': 'private, no-store',
      'referrer-policy': 'no-referrer',
    },
  });
});
