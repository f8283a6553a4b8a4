import { NextResponse } from 'next/server';
import { AppError } from '@/lib/errors';
import { handle } from '@/lib/http';
import { startCheckout } from '@/lib/data/payments';
import { refusedLinkText } from '@/lib/report/link-access';
import { reportLinkUrl, verifyReportLink } from '@/lib/report/link';

/**
 * "Pay now" on the customer's report page: the signed link names the company and the job, so the
 * customer needs no account. Sends the browser to the payment provider's hosted checkout (303).
 */
export const POST = handle(async (_request: Request, { params }: { params: Promise<{ token: string }> }) => {
  const token = (await params).token;
  const check = verifyReportLink(token);
  if (!check.ok) return new Response(refusedLinkText(null), { status: 404, headers: { 'content-type': 'text/plain; charset=utf-8' } });
  const page = reportLinkUrl(token);
  try {
    return NextResponse.redirect(await startCheckout(check.companyId, check.jobId, page), 303);
  } catch (error) {
    // Already paid (409) or nothing to pay (404): back to the report, which says which.
    if (error instanceof AppError && (error.status === 409 || error.status === 404)) return NextResponse.redirect(page, 303);
    throw error;
  }
});
