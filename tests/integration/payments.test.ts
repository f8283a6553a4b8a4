import { randomUUID } from 'node:crypto';
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as webhookRoute } from '@/app/api/payments/webhook/route';
import { startCheckout } from '@/lib/data/payments';
import { Invoice, Job, PaymentEvent } from '@/models';
import { makeWorld, type World } from './helpers/world';
import { linkToken } from './report-fixtures';

// The payment fake (scripts/fakes/payments.fake.mjs, started by scripts/test.sh) delivers its signed
// webhook over a real socket to the origin of the checkout's success URL: this little server, which
// hands the request to the route handler as Next would.
let server: Server;
let origin: string;
const received: { status: number; body: unknown }[] = [];

beforeAll(async () => {
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
    received.push({ status: answer.status, body });
    response.writeHead(answer.status, { 'content-type': 'application/json' });
    response.end(JSON.stringify(body));
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  origin = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
});
afterAll(() => new Promise<void>((resolve) => server.close(() => resolve())));

const secret = () => process.env.STRIPE_WEBHOOK_SECRET!;
const sign = (payload: string, withSecret = secret()) =>
  Stripe.webhooks.generateTestHeaderString({ payload, secret: withSecret });
const post = (payload: string, signature?: string) =>
  webhookRoute(
    new Request(`${origin}/api/payments/webhook`, {
      method: 'POST',
      headers: signature ? { 'stripe-signature': signature } : {},
      body: payload,
    }),
  );

describe('online payment of an invoice (payment fake over sockets)', () => {
  let a: World;
  let invoice: Invoice;
  beforeAll(async () => {
    a = await makeWorld('Pay');
    invoice = await Invoice.create({
      companyId: a.company.id,
      jobId: a.job.id,
      number: `INV-${a.job.number}`,
      status: 'issued',
      dueOn: '2026-12-31',
      subtotalCents: 200_000,
      taxCents: 16_500,
      totalCents: 216_500,
    });
  });

  it('refuses a draft or unknown invoice before talking to the provider', async () => {
    const job = await Job.create({
      companyId: a.company.id,
      number: `D-${a.job.number}`.slice(0, 20),
      customerId: a.customer.id,
      siteId: a.site.id,
      status: 'approved',
    });
    await Invoice.create({
      companyId: a.company.id,
      jobId: job.id,
      number: 'INV-DRAFT',
      dueOn: '2026-12-31',
      subtotalCents: 100,
      totalCents: 100,
    });
    await expect(startCheckout(a.company.id, job.id, `${origin}/r/x`)).rejects.toMatchObject({ status: 404 });
    await expect(startCheckout(a.company.id, randomUUID(), `${origin}/r/x`)).rejects.toMatchObject({ status: 404 });
  });

  it('refuses a webhook with a wrong, missing or stale signature and changes nothing', async () => {
    const payload = JSON.stringify({
      id: 'evt_forged',
      object: 'event',
      type: 'checkout.session.completed',
      data: {
        object: {
          id: 'cs_x',
          payment_status: 'paid',
          amount_total: 216_500,
          currency: 'usd',
          metadata: { invoiceId: invoice.id, companyId: a.company.id },
        },
      },
    });
    expect((await post(payload, sign(payload, 'whsec_not_ours'))).status).toBe(400);
    expect((await post(payload)).status).toBe(400);
    const stale = Stripe.webhooks.generateTestHeaderString({
      payload,
      secret: secret(),
      timestamp: Math.floor(Date.now() / 1000) - 3600,
    });
    expect((await post(payload, stale)).status).toBe(400);
    expect((await post(`${payload} `, sign(payload))).status).toBe(400); // body altered after signing
    expect((await invoice.reload()).status).toBe('issued');
    expect(await PaymentEvent.count({ where: { invoiceId: invoice.id } })).toBe(0);
  });

  it('the customer pays on the hosted page; the signed webhook marks the invoice paid, once', async () => {
    const url = await startCheckout(a.company.id, a.job.id, `${origin}/r/token`);
    expect(url).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/pay\/cs_test_/);
    const page = await fetch(url);
    expect(await page.text()).toContain('$2,165.00');
    const paid = await fetch(url, { method: 'POST', redirect: 'manual' });
    expect(paid.status).toBe(303);
    expect(paid.headers.get('location')).toBe(`${origin}/r/token?paid=1`);
    expect(received.at(-1)).toEqual({ status: 200, body: { received: true, outcome: 'paid' } });
    await invoice.reload();
    expect(invoice.status).toBe('paid');
    expect(invoice.paidCents).toBe(216_500);
    expect(invoice.paidAt).toBeInstanceOf(Date);
    await expect(startCheckout(a.company.id, a.job.id, `${origin}/r/token`)).rejects.toMatchObject({ status: 409 });
  });

  it('a replayed event is acknowledged and changes nothing; a short payment does not mark paid', async () => {
    const event = await PaymentEvent.findOne({ where: { invoiceId: invoice.id } });
    const session = {
      id: 'cs_replay',
      payment_status: 'paid',
      amount_total: 216_500,
      currency: 'usd',
      metadata: { invoiceId: invoice.id, companyId: a.company.id },
    };
    const replay = JSON.stringify({
      id: event!.providerEventId,
      object: 'event',
      type: 'checkout.session.completed',
      data: { object: session },
    });
    expect(await (await post(replay, sign(replay))).json()).toEqual({ received: true, outcome: 'duplicate' });

    const job = await Job.create({
      companyId: a.company.id,
      number: `S-${a.job.number}`.slice(0, 20),
      customerId: a.customer.id,
      siteId: a.site.id,
      status: 'approved',
    });
    const other = await Invoice.create({
      companyId: a.company.id,
      jobId: job.id,
      number: 'INV-SHORT',
      status: 'issued',
      dueOn: '2026-12-31',
      subtotalCents: 10_000,
      taxCents: 0,
      totalCents: 10_000,
    });
    const short = JSON.stringify({
      id: `evt_short_${randomUUID()}`,
      object: 'event',
      type: 'checkout.session.completed',
      data: {
        object: {
          ...session,
          id: 'cs_short',
          amount_total: 1,
          metadata: { invoiceId: other.id, companyId: a.company.id },
        },
      },
    });
    expect(await (await post(short, sign(short))).json()).toEqual({ received: true, outcome: 'mismatch' });
    expect((await other.reload()).status).toBe('issued');
    // An event naming another company for the invoice is ignored.
    const foreign = JSON.stringify({
      id: `evt_foreign_${randomUUID()}`,
      object: 'event',
      type: 'checkout.session.completed',
      data: {
        object: {
          ...session,
          id: 'cs_f',
          amount_total: 10_000,
          metadata: { invoiceId: other.id, companyId: a.otherCrew.id },
        },
      },
    });
    expect(await (await post(foreign, sign(foreign))).json()).toEqual({ received: true, outcome: 'ignored' });
    expect((await other.reload()).status).toBe('issued');
  });
});

describe('"Pay now" behind the customer link', () => {
  it('sends a valid link to the hosted checkout, refuses a tampered one, and returns a paid one to the report', async () => {
    const { POST: payRoute } = await import('@/app/r/[token]/pay/route');
    const world = await makeWorld('Link');
    const invoice = await Invoice.create({
      companyId: world.company.id,
      jobId: world.job.id,
      number: 'INV-LINK',
      status: 'issued',
      dueOn: '2026-12-31',
      subtotalCents: 5000,
      totalCents: 5000,
    });
    const token = await linkToken(world.job.id, world.company.id);
    const pay = (t: string) =>
      payRoute(new Request(`http://localhost/r/${t}/pay`, { method: 'POST' }), {
        params: Promise.resolve({ token: t }),
      });

    const ok = await pay(token);
    expect(ok.status).toBe(303);
    expect(ok.headers.get('location')).toMatch(/\/pay\/cs_test_/);
    expect((await invoice.reload()).paymentSessionId).toMatch(/^cs_test_/);

    const tampered = `${token.slice(0, -2)}${token.endsWith('A') ? 'B' : 'A'}A`;
    expect((await pay(tampered)).status).toBe(404);

    await invoice.update({ status: 'paid' });
    const back = await pay(token);
    expect(back.status).toBe(303);
    expect(back.headers.get('location')).toContain(`/r/${token}`);
  });
});
