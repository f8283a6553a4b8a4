import { NextResponse } from 'next/server';
import { AppError } from '@/lib/server/errors';
import { handle } from '@/lib/server/http';
import { startCheckout } from '@/lib/data/payments';
import { RETURN_COOKIE, returnCookieOptions } from '@/lib/report/payment-return';
import { checkLiveLink, refusedLinkText } from '@/lib/report/link-access';
import { paymentReturnUrl, reportLinkUrl } from '@/lib/report/link';

/**
 * "Pay now" on the customer's report page: the signed link names the company and the job, so the
 * customer needs no account. Sends the browser to the payment provider's hosted checkout (303). The
 * provider only learns an opaque return address (/r/back/<link id>); the token rides in a short-lived
 * cookie of ours, so the customer still lands back on the report.
 */
export const POST = handle(async (request: Request, { params }: { params: Promise<{ token: string }> }) => {
  const token = (await params).token;
  const check = await checkLiveLink(token);
  if (!check.ok)
    return new Response(refusedLinkText(null, request.headers.get('accept-language')), {
      status: 404,
      headers: { 'content-type': 'text/plain; charset=utf-8' },
    });
  const page = reportLinkUrl(token);
  try {
    const response = NextResponse.redirect(
      await startCheckout(check.companyId, check.jobId, paymentReturnUrl(check.linkId)),
      303,
    );
    response.cookies.set(RETURN_COOKIE, token, returnCookieOptions(request));
    return response;
  } catch (error) {
    // Already paid or being confirmed (409), or nothing to pay (404): back to the report, which says which.
    if (error instanceof AppError && (error.status === 409 || error.status === 404))
      return NextResponse.redirect(page, 303);
    throw error;
  }
});
