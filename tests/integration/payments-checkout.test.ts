import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as webhookRoute } from '@/app/api/payments/webhook/route';
import { POST as payRoute } from '@/app/r/[token]/pay/route';
import { POST as invoiceStatusRoute } from '@/app/api/invoices/[id]/status/route';
import BackPage from '@/app/r/back/[linkId]/page';
import { startCheckout } from '@/lib/data/payments';
import { stripeClient } from '@/lib/payments/stripe';
import { verifyReportLink } from '@/lib/report/link';
import { RETURN_COOKIE } from '@/lib/report/payment-return';
import { AuditEntry, Invoice, PaymentEvent } from '@/models';
import { call, jsonBody } from './helpers/call';
import { cookieJar, signInAs } from './helpers/session';
import { makeWorld, type World } from './helpers/world';
import { eventually, linkToken } from './report-fixtures';

// "Pay now" and the payment webhook against the payment fake (scripts/fakes/payments.fake.mjs) over
// sockets: one open checkout per invoice, the provider never sees the link token, and a payment that
// does not match is kept and shown to the office.

let server: Server;
let origin: string;
const outcomes: string[] = [];

beforeAll(async () => {
  // The fake delivers its signed webhook to the origin of the session's return address: this server,
  // which hands the request to the route handler as Next would.
  server = createServer(async (request, response) => {
    const chunks: Buffer[] = [];
    for await (const chunk of request) chunks.push(chunk as Buffer);
    const answer = await webhookRoute(
      new Request(`${origin}${request.url}`, {
        method: 'POST',
        headers: request.headers as Record<string, string>,
        body: Buffer.concat(chunks),
      }),
    );
    const body = await answer.json();
    outcomes.push(body.outcome);
    response.writeHead(answer.status, { 'content-type': 'application/json' });
    response.end(JSON.stringify(body));
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  origin = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  process.env.APP_URL = origin;
});
afterAll(async () => {
  delete process.env.APP_URL;
  await new Promise<void>((resolve) => server.close(() => resolve()));
});

const pay = (token: string) =>
  payRoute(new Request(`${origin}/r/${token}/pay`, { method: 'POST' }), { params: Promise.resolve({ token }) });
const sessionOf = (id: string) => stripeClient().checkout.sessions.retrieve(id);

async function issuedInvoice(w: World, totalCents = 12_345) {
  return Invoice.create({
    companyId: w.company.id,
    jobId: w.job.id,
    number: `INV-${w.job.number}`,
    status: 'issued',
    dueOn: '2026-12-31',
    subtotalCents: totalCents,
    totalCents,
  });
}

describe('"Pay now": one open checkout per invoice', () => {
  it('reuses the open checkout on a second click; the provider gets an opaque return address, never the token', async () => {
    const w = await makeWorld('Once');
    const invoice = await issuedInvoice(w);
    const token = await linkToken(w.job.id, w.company.id);
    const linkId = (verifyReportLink(token) as { linkId: string }).linkId;

    const first = await pay(token);
    expect(first.status).toBe(303);
    const url = first.headers.get('location')!;
    expect(url).toMatch(/\/pay\/cs_test_/);
    const sessionId = (await invoice.reload()).paymentSessionId!;
    const second = await pay(token);
    expect(second.headers.get('location')).toBe(url);
    expect((await invoice.reload()).paymentSessionId).toBe(sessionId);

    const session = await sessionOf(sessionId);
    expect(session.status).toBe('open');
    expect(session.success_url).toBe(`${origin}/r/back/${linkId}?paid=1`);
    expect(session.cancel_url).toBe(`${origin}/r/back/${linkId}`);
    expect(JSON.stringify(session)).not.toContain(token.split('.')[1]);
    // The token travels in our own cookie, for our /r/back page only.
    const cookie = first.headers.get('set-cookie') ?? '';
    expect(cookie).toContain(`${RETURN_COOKIE}=`);
    expect(cookie).toMatch(/Path=\/r\/back/i);
    expect(cookie).toMatch(/HttpOnly/i);
  });

  it('expires the old checkout before opening one for another return address; the old page can no longer take money', async () => {
    const w = await makeWorld('Swap');
    const invoice = await issuedInvoice(w);
    const oldToken = await linkToken(w.job.id, w.company.id);
    const oldUrl = (await pay(oldToken)).headers.get('location')!;
    const oldSession = (await invoice.reload()).paymentSessionId!;

    const newToken = await linkToken(w.job.id, w.company.id); // a newer report e-mail
    const newUrl = (await pay(newToken)).headers.get('location')!;
    expect(newUrl).not.toBe(oldUrl);
    expect((await sessionOf(oldSession)).status).toBe('expired');
    expect((await sessionOf((await invoice.reload()).paymentSessionId!)).status).toBe('open');
    expect((await fetch(oldUrl, { method: 'POST', redirect: 'manual' })).status).toBe(410);
    expect(await PaymentEvent.count({ where: { invoiceId: invoice.id } })).toBe(0);
  });

  it('voiding the invoice expires its open checkout', async () => {
    const w = await makeWorld('Void');
    const invoice = await issuedInvoice(w);
    await pay(await linkToken(w.job.id, w.company.id));
    const sessionId = (await invoice.reload()).paymentSessionId!;
    await signInAs(w.office);
    const { status } = await call(
      invoiceStatusRoute,
      `/api/invoices/${invoice.id}/status`,
      { id: invoice.id },
      jsonBody('POST', { action: 'void', reason: 'Wrong customer' }),
    );
    expect(status).toBe(200);
    expect((await sessionOf(sessionId)).status).toBe('expired');
  });

  it('the way back: the customer with the cookie lands on the report; anyone else gets a page without it', async () => {
    const w = await makeWorld('Back');
    const token = await linkToken(w.job.id, w.company.id);
    const linkId = (verifyReportLink(token) as { linkId: string }).linkId;
    const back = (id: string, paid?: string) =>
      BackPage({ params: Promise.resolve({ linkId: id }), searchParams: Promise.resolve(paid ? { paid } : {}) });

    cookieJar.clear();
    cookieJar.set(RETURN_COOKIE, token);
    await expect(back(linkId, '1')).rejects.toMatchObject({ digest: expect.stringContaining(`/r/${token}?paid=1`) });
    // Another link's id, or no cookie (the provider following its own URL): a plain page.
    const other = (verifyReportLink(await linkToken(w.job.id, w.company.id)) as { linkId: string }).linkId;
    expect(JSON.stringify(await back(other, '1'))).not.toContain(token);
    cookieJar.clear();
    const page = JSON.stringify(await back(linkId, '1'));
    expect(page).toContain('Your payment is being confirmed');
    expect(page).not.toContain(token);
  });
});

describe('a payment that does not match is recorded and shown', () => {
  it('a second payment on a paid invoice (an old checkout paid late): kept, alert on the invoice, line in the job’s history', async () => {
    const w = await makeWorld('Twice');
    const invoice = await issuedInvoice(w, 20_000);
    const url = (await pay(await linkToken(w.job.id, w.company.id))).headers.get('location')!;
    // A checkout made outside the one-open rule (a stale tab, a copied page): the provider's own API.
    const stray = await stripeClient().checkout.sessions.create({
      mode: 'payment',
      metadata: { invoiceId: invoice.id, companyId: w.company.id },
      success_url: `${origin}/r/back/x?paid=1`,
      line_items: [
        { quantity: 1, price_data: { currency: 'usd', unit_amount: 20_000, product_data: { name: 'Invoice' } } },
      ],
    });
    await fetch(url, { method: 'POST', redirect: 'manual' });
    await eventually(
      async () => ((await invoice.reload()).status === 'paid' ? true : undefined),
      10_000,
      'the first payment',
    );
    await fetch(stray.url!, { method: 'POST', redirect: 'manual' });
    await eventually(async () => ((await invoice.reload()).paymentAlert ? true : undefined), 10_000, 'the alert');

    expect(invoice).toMatchObject({ status: 'paid', paidCents: 20_000 });
    expect(invoice.paymentAlert).toBe(
      `A second payment of $200.00 was received for invoice ${invoice.number}, which was already paid: refund it or settle it with the customer.`,
    );
    const events = await PaymentEvent.findAll({ where: { invoiceId: invoice.id }, order: [['createdAt', 'ASC']] });
    expect(events.map((e) => e.problem)).toEqual([null, 'already_paid']);
    const history = await AuditEntry.findOne({
      where: { entityType: 'job', entityId: w.job.id, action: 'payment_mismatch' },
    });
    expect(history?.reason).toBe(invoice.paymentAlert);
    expect(history?.changes).toMatchObject({ problem: 'already_paid', amountCents: 20_000 });
  });

  it('a wrong amount or a wrong currency is not applied and raises the alert', async () => {
    for (const [currency, amount, problem, words] of [
      ['usd', 1_000, 'amount', 'which totals $50.00'],
      ['eur', 5_000, 'currency', 'in EUR was received'],
    ] as const) {
      const w = await makeWorld('Wrong');
      const invoice = await issuedInvoice(w, 5_000);
      const session = await stripeClient().checkout.sessions.create({
        mode: 'payment',
        metadata: { invoiceId: invoice.id, companyId: w.company.id },
        success_url: `${origin}/r/back/x?paid=1`,
        line_items: [{ quantity: 1, price_data: { currency, unit_amount: amount, product_data: { name: 'Invoice' } } }],
      });
      await fetch(session.url!, { method: 'POST', redirect: 'manual' });
      await eventually(async () => ((await invoice.reload()).paymentAlert ? true : undefined), 10_000, 'the alert');
      expect(invoice.status).toBe('issued');
      expect(invoice.paidAt).toBeNull();
      expect(invoice.paymentAlert).toContain(words);
      expect((await PaymentEvent.findOne({ where: { invoiceId: invoice.id } }))?.problem).toBe(problem);
      expect(
        await AuditEntry.count({ where: { entityType: 'job', entityId: w.job.id, action: 'payment_mismatch' } }),
      ).toBe(1);
    }
    expect(outcomes).toContain('mismatch');
  });

  it('refuses a second checkout once paid (the customer is sent back to the report)', async () => {
    const w = await makeWorld('Paid');
    const invoice = await issuedInvoice(w);
    const token = await linkToken(w.job.id, w.company.id);
    await invoice.update({ status: 'paid', paidAt: new Date(), paidCents: invoice.totalCents });
    const answer = await pay(token);
    expect(answer.status).toBe(303);
    expect(answer.headers.get('location')).toBe(`${origin}/r/${token}`);
    await expect(startCheckout(w.company.id, w.job.id, `${origin}/r/back/x`)).rejects.toMatchObject({ status: 409 });
  });
});
