import { NextResponse } from 'next/server';
import { applyPaymentEvent } from '@/lib/data/payments';
import { handle, readBodyText } from '@/lib/server/http';
import { verifiedEvent } from '@/lib/payments/stripe';

/**
 * The payment provider's webhook. No session: the signature over the raw body is the authentication,
 * so a wrong or missing signature is refused (400) before anything is read or written.
 */
export const POST = handle(async (request: Request) => {
  const event = verifiedEvent(await readBodyText(request), request.headers.get('stripe-signature'));
  const outcome = await applyPaymentEvent(event);
  return NextResponse.json({ received: true, outcome });
});
