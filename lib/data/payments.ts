import 'server-only';
import type Stripe from 'stripe';
import { z } from 'zod';
import { UniqueConstraintError } from 'sequelize';
import { AuditEntry, Customer, Invoice, Job, PaymentEvent } from '@/models';
import { sequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { stripeClient } from '@/lib/payments/stripe';

const text = (max: number) => z.string().max(max).refine((value) => !value.includes('\u0000'));

/** The fields of a completed checkout session we read, as our columns can hold them. */
const completedSessionSchema = z.object({
  eventId: text(255).min(1),
  session: z.object({
    id: text(255).nullish(),
    payment_status: z.string().nullish(),
    amount_total: z.number().int().min(0).max(2_147_483_647).nullish(),
    currency: text(10).nullish(),
    metadata: z.object({ invoiceId: z.uuid(), companyId: z.uuid() }),
  }),
});

/**
 * Opens a hosted checkout for the job's issued invoice and answers the URL to send the customer to.
 * Only ever called after the customer's signed link has been verified (it names the company and job).
 */
export async function startCheckout(companyId: string, jobId: string, returnUrl: string): Promise<string> {
  const invoice = await Invoice.findOne({
    where: { companyId, jobId, status: ['issued', 'paid'] },
    include: [{ model: Job, as: 'job', attributes: ['id', 'number'], include: [{ model: Customer, as: 'customer', attributes: ['email'] }] }],
  });
  if (!invoice) throw new AppError(404, 'There is no invoice to pay for this job.');
  if (invoice.status === 'paid') throw new AppError(409, `Invoice ${invoice.number} is already paid. Thank you.`);
  const job = (invoice as Invoice & { job: Job & { customer: Customer | null } }).job;
  const session = await stripeClient().checkout.sessions.create({
    mode: 'payment',
    client_reference_id: invoice.id,
    customer_email: job.customer?.email ?? undefined,
    metadata: { invoiceId: invoice.id, companyId },
    line_items: [{ quantity: 1, price_data: { currency: invoice.currency, unit_amount: invoice.totalCents, product_data: { name: `Invoice ${invoice.number}` } } }],
    success_url: `${returnUrl}?paid=1`,
    cancel_url: returnUrl,
  });
  await invoice.update({ paymentSessionId: session.id });
  if (!session.url) throw new AppError(502, 'The payment provider did not return a checkout page.');
  return session.url;
}

export type PaymentOutcome = 'paid' | 'duplicate' | 'ignored' | 'mismatch';

/**
 * Applies a verified provider event. A completed checkout marks the invoice paid when the amount and
 * currency match; each event id is applied once (a replayed webhook changes nothing).
 */
export async function applyPaymentEvent(event: Stripe.Event): Promise<PaymentOutcome> {
  // A signed body is still any JSON (even `null`): only an object with the expected type is read.
  if (event?.type !== 'checkout.session.completed') return 'ignored';
  // Signed is not well-formed: a session whose fields do not fit our columns is ignored, never a 500.
  const parsed = completedSessionSchema.safeParse({ eventId: event.id, session: event.data?.object });
  if (!parsed.success) return 'ignored';
  const { eventId, session } = parsed.data;
  const { invoiceId, companyId } = session.metadata;
  if (session.payment_status !== 'paid') return 'ignored';
  try {
    return await sequelize.transaction(async (transaction) => {
      const invoice = await Invoice.findOne({ where: { id: invoiceId, companyId }, transaction, lock: transaction.LOCK.UPDATE });
      if (!invoice) return 'ignored';
      await PaymentEvent.create(
        { companyId, invoiceId, providerEventId: eventId, type: event.type, amountCents: session.amount_total ?? null, payload: { session: session.id, currency: session.currency } },
        { transaction },
      );
      const matches = session.amount_total === invoice.totalCents && session.currency === invoice.currency && invoice.status === 'issued';
      if (!matches) return 'mismatch';
      await invoice.update({ status: 'paid', paidAt: new Date(), paidCents: session.amount_total }, { transaction });
      await AuditEntry.create(
        { companyId, userId: null, action: 'paid', entityType: 'invoice', entityId: invoice.id, changes: { paidCents: session.amount_total, session: session.id }, reason: 'Paid online by the customer' },
        { transaction },
      );
      return 'paid';
    });
  } catch (error) {
    if (error instanceof UniqueConstraintError) return 'duplicate';
    throw error;
  }
}
