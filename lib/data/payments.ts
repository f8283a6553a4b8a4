import 'server-only';
import type Stripe from 'stripe';
import { z } from 'zod';
import { UniqueConstraintError, type Transaction } from 'sequelize';
import { AuditEntry, Customer, Invoice, Job, PaymentEvent } from '@/models';
import { sequelize } from '@/lib/data/db';
import type { PaymentProblem } from '@/lib/domain/vocabulary';
import { AppError } from '@/lib/server/errors';
import { formatMoney } from '@/lib/invoice/money';
import { stripeClient } from '@/lib/payments/stripe';

const text = (max: number) =>
  z
    .string()
    .max(max)
    .refine((value) => !value.includes('\u0000'));

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
 * Sends the customer to a hosted checkout for the job's issued invoice and answers its URL. One open
 * checkout per invoice: an open one made for the same amount, currency and return address is reused;
 * any other open one is expired at the provider before a new one is made. The invoice row stays locked
 * meanwhile, so two quick clicks cannot open two. `returnUrl` is the opaque return address (no link
 * token: see paymentReturnUrl). Only ever called after the customer's signed link has been checked.
 */
export async function startCheckout(companyId: string, jobId: string, returnUrl: string): Promise<string> {
  return sequelize.transaction(async (transaction) => {
    const invoice = await Invoice.findOne({
      where: { companyId, jobId, status: ['issued', 'paid'] },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!invoice) throw new AppError(404, 'There is no invoice to pay for this job.');
    if (invoice.status === 'paid') throw new AppError(409, `Invoice ${invoice.number} is already paid. Thank you.`);
    const successUrl = `${returnUrl}?paid=1`;
    const open = invoice.paymentSessionId ? await currentSession(invoice.paymentSessionId) : null;
    if (open?.status === 'complete')
      throw new AppError(409, `A payment of invoice ${invoice.number} is being confirmed.`);
    if (open?.status === 'open') {
      const same =
        open.amount_total === invoice.totalCents &&
        open.currency === invoice.currency &&
        open.success_url === successUrl;
      if (same && open.url) return open.url;
      await expireSession(open.id, invoice.number);
    }
    const session = await createSession(invoice, successUrl, returnUrl, transaction);
    await invoice.update({ paymentSessionId: session.id }, { transaction });
    if (!session.url) throw new AppError(502, 'The payment provider did not return a checkout page.');
    return session.url;
  });
}

/** Expires the invoice's open checkout (e.g. when the invoice is voided); a session already closed is fine. */
export async function closeCheckoutOf(invoice: Pick<Invoice, 'paymentSessionId' | 'number'>) {
  if (!invoice.paymentSessionId) return;
  const open = await currentSession(invoice.paymentSessionId);
  if (open?.status === 'open') await expireSession(open.id, invoice.number);
}

export type PaymentOutcome = 'paid' | 'duplicate' | 'ignored' | 'mismatch';

/**
 * Applies a verified provider event. A completed checkout marks the invoice paid when the amount and
 * currency match an issued invoice; each event id is applied once (a replayed webhook changes nothing).
 * A payment that does not match (a second payment, a wrong amount or currency, an invoice no longer
 * open) is recorded with its problem, raises the invoice's payment alert and goes into the job's history.
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
      const invoice = await Invoice.findOne({
        where: { id: invoiceId, companyId },
        transaction,
        lock: transaction.LOCK.UPDATE,
      });
      if (!invoice) return 'ignored';
      const problem = problemOf(invoice, session);
      await PaymentEvent.create(
        {
          companyId,
          invoiceId,
          providerEventId: eventId,
          type: event.type,
          amountCents: session.amount_total ?? null,
          problem,
          payload: { session: session.id, currency: session.currency },
        },
        { transaction },
      );
      if (problem) {
        await raiseAlert(invoice, problem, session, transaction);
        return 'mismatch';
      }
      await invoice.update({ status: 'paid', paidAt: new Date(), paidCents: session.amount_total }, { transaction });
      await AuditEntry.create(
        {
          companyId,
          userId: null,
          action: 'paid',
          entityType: 'invoice',
          entityId: invoice.id,
          changes: { paidCents: session.amount_total, session: session.id },
          reason: 'Paid online by the customer',
        },
        { transaction },
      );
      return 'paid';
    });
  } catch (error) {
    if (error instanceof UniqueConstraintError) return 'duplicate';
    throw error;
  }
}

/** What is wrong with applying this payment to this invoice, or null when it settles it. */
/** The fields of a completed session that the webhook reads (checked by completedSessionSchema). */
type PaidSession = z.infer<typeof completedSessionSchema>['session'];

function problemOf(
  invoice: Pick<Invoice, 'status' | 'totalCents' | 'currency'>,
  session: Pick<PaidSession, 'amount_total' | 'currency'>,
): PaymentProblem | null {
  if (invoice.status === 'paid') return 'already_paid';
  if (invoice.status !== 'issued') return 'not_open';
  if (session.currency !== invoice.currency) return 'currency';
  if (session.amount_total !== invoice.totalCents) return 'amount';
  return null;
}

/** The sentence of a payment alert, for the office. */
function alertText(
  problem: PaymentProblem,
  invoice: Pick<Invoice, 'number' | 'status' | 'totalCents' | 'currency'>,
  paid: { amountCents: number | null; currency: string | null },
) {
  const amount =
    paid.amountCents === null ? 'an unknown amount' : formatMoney(paid.amountCents, paid.currency ?? invoice.currency);
  const settle = 'refund it or settle it with the customer.';
  switch (problem) {
    case 'already_paid':
      return `A second payment of ${amount} was received for invoice ${invoice.number}, which was already paid: ${settle}`;
    case 'not_open':
      return `A payment of ${amount} was received for invoice ${invoice.number} while it is ${invoice.status}; it was not applied: ${settle}`;
    case 'currency':
      return (
        `A payment of ${amount} in ${(paid.currency ?? '?').toUpperCase()} was received for invoice ${invoice.number}, billed in ` +
        `${invoice.currency.toUpperCase()}; it was not applied: ${settle}`
      );
    case 'amount':
      return (
        `A payment of ${amount} was received for invoice ${invoice.number}, which totals ${formatMoney(invoice.totalCents, invoice.currency)}; it ` +
        `was not applied: ${settle}`
      );
  }
}

async function raiseAlert(invoice: Invoice, problem: PaymentProblem, session: PaidSession, transaction: Transaction) {
  const text = alertText(problem, invoice, {
    amountCents: session.amount_total ?? null,
    currency: session.currency ?? null,
  });
  await invoice.update({ paymentAlert: text, paymentAlertAt: new Date() }, { transaction });
  const changes = {
    invoice: invoice.number,
    problem,
    amountCents: session.amount_total ?? null,
    currency: session.currency ?? null,
    session: session.id ?? null,
  };
  // In the job's history (the job page) and the invoice's own.
  for (const [entityType, entityId] of [
    ['job', invoice.jobId],
    ['invoice', invoice.id],
  ] as const) {
    await AuditEntry.create(
      {
        companyId: invoice.companyId,
        userId: null,
        action: 'payment_mismatch',
        entityType,
        entityId,
        changes,
        reason: text,
      },
      { transaction },
    );
  }
}

async function createSession(invoice: Invoice, successUrl: string, cancelUrl: string, transaction: Transaction) {
  const job = await Job.findOne({
    where: { id: invoice.jobId, companyId: invoice.companyId },
    attributes: ['id', 'customerId'],
    transaction,
  });
  const customer = job
    ? await Customer.findOne({
        where: { id: job.customerId, companyId: invoice.companyId },
        attributes: ['email'],
        transaction,
      })
    : null;
  return stripeClient().checkout.sessions.create({
    mode: 'payment',
    client_reference_id: invoice.id,
    customer_email: customer?.email ?? undefined,
    metadata: { invoiceId: invoice.id, companyId: invoice.companyId },
    line_items: [
      {
        quantity: 1,
        price_data: {
          currency: invoice.currency,
          unit_amount: invoice.totalCents,
          product_data: { name: `Invoice ${invoice.number}` },
        },
      },
    ],
    success_url: successUrl,
    cancel_url: cancelUrl,
  });
}

/** The provider's view of a session, or null when it no longer knows it. */
async function currentSession(id: string): Promise<Stripe.Checkout.Session | null> {
  try {
    return await stripeClient().checkout.sessions.retrieve(id);
  } catch (error) {
    if ((error as { statusCode?: number }).statusCode === 404) return null;
    throw error;
  }
}

/** Expires an open session; if it completed meanwhile, the payment is on its way (409). */
async function expireSession(id: string, invoiceNumber: string) {
  try {
    await stripeClient().checkout.sessions.expire(id);
  } catch (error) {
    const status = (error as { statusCode?: number }).statusCode;
    if (status === 404) return;
    const now = await currentSession(id);
    if (now?.status === 'complete')
      throw new AppError(409, `A payment of invoice ${invoiceNumber} is being confirmed.`);
    if (now?.status === 'expired') return;
    throw error;
  }
}
