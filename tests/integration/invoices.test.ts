import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { GET as listRoute, POST as createRoute } from '@/app/api/invoices/route';
import { GET as getRoute, PATCH as patchRoute } from '@/app/api/invoices/[id]/route';
import { POST as statusRoute } from '@/app/api/invoices/[id]/status/route';
import { AuditEntry, Invoice, InvoiceLine, Job, Repair } from '@/models';
import { makeWorld, type World } from './helpers/world';
import { signInAs, signOut } from './helpers/session';
import { call, jsonBody } from './helpers/call';

const line = (overrides: Record<string, unknown> = {}) => ({
  description: 'Point repair, 900 mm patch',
  quantity: 1,
  unitPriceCents: 185_000,
  ...overrides,
});

describe('invoices API', () => {
  let a: World;
  let b: World;
  beforeAll(async () => {
    a = await makeWorld('Alpha');
    b = await makeWorld('Beta');
  });
  beforeEach(() => signOut());

  const body = (overrides: Record<string, unknown> = {}) => ({
    jobId: a.job.id,
    taxRatePct: 8.25,
    dueOn: '2026-12-31',
    lines: [line({ repairId: a.repair.id }), line({ description: 'Mobilisation', unitPriceCents: 25_000 })],
    ...overrides,
  });
  const invoiceCount = () => Invoice.count({ where: { companyId: a.company.id } });

  it('answers 401 without a session and 403 to field roles, reading or writing', async () => {
    expect((await call(listRoute, '/api/invoices')).status).toBe(401);
    for (const user of [a.foreman, a.technician]) {
      await signInAs(user);
      expect((await call(listRoute, '/api/invoices')).status).toBe(403);
      expect((await call(createRoute, '/api/invoices', {}, jsonBody('POST', body()))).status).toBe(403);
    }
    expect(await invoiceCount()).toBe(0);
  });

  it('refuses bad input with field messages and writes nothing', async () => {
    await signInAs(a.office);
    const bad = await call(
      createRoute,
      '/api/invoices',
      {},
      jsonBody('POST', {
        jobId: 'x',
        taxRatePct: 80,
        dueOn: 'soon',
        lines: [line({ quantity: 0, unitPriceCents: 10.5 })],
      }),
    );
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(
      expect.arrayContaining(['jobId', 'taxRatePct', 'dueOn', 'lines.0.quantity', 'lines.0.unitPriceCents']),
    );
    expect((await call(createRoute, '/api/invoices', {}, jsonBody('POST', body({ lines: [] })))).status).toBe(400);
    // Another company's job, or a repair that is not on the job: 422, nothing written.
    expect((await call(createRoute, '/api/invoices', {}, jsonBody('POST', body({ jobId: b.job.id })))).status).toBe(
      422,
    );
    expect(
      (
        await call(
          createRoute,
          '/api/invoices',
          {},
          jsonBody('POST', body({ lines: [line({ repairId: b.repair.id })] })),
        )
      ).status,
    ).toBe(422);
    expect(await invoiceCount()).toBe(0);
  });

  it('creates a draft from lines in cents: per-line amounts, tax on the subtotal, total; one live invoice per job', async () => {
    await signInAs(a.office);
    const made = await call(createRoute, '/api/invoices', {}, jsonBody('POST', body()));
    expect(made.status).toBe(201);
    // 1 850.00 + 250.00 = 2 100.00; 8.25 % of it = 173.25 (hand-computed); total 2 273.25.
    expect(made.body).toMatchObject({
      number: `INV-${a.job.number}`,
      status: 'draft',
      currency: 'usd',
      taxRateBp: 825,
      subtotalCents: 210_000,
      taxCents: 17_325,
      totalCents: 227_325,
    });
    expect(made.body.lines.map((l: { amountCents: number }) => l.amountCents)).toEqual([185_000, 25_000]);
    expect(made.body.job.customer.name).toBe(a.customer.name);
    expect(await AuditEntry.count({ where: { entityId: made.body.id, action: 'create' } })).toBe(1);
    const again = await call(createRoute, '/api/invoices', {}, jsonBody('POST', body()));
    expect(again.status).toBe(409);
  });

  it('edits a draft (totals recomputed), issues it, then refuses edits; voids an issued one but never a paid one', async () => {
    await signInAs(a.office);
    const invoice = await Invoice.findOne({ where: { jobId: a.job.id } });
    const edited = await call(
      patchRoute,
      '/x',
      { id: invoice!.id },
      jsonBody('PATCH', { taxRatePct: 0, lines: [line({ quantity: 2.5, unitPriceCents: 1999 })] }),
    );
    expect(edited.status).toBe(200);
    expect(edited.body).toMatchObject({ subtotalCents: 4998, taxCents: 0, totalCents: 4998 });
    expect(await InvoiceLine.count({ where: { invoiceId: invoice!.id } })).toBe(1);
    expect((await call(patchRoute, '/x', { id: invoice!.id }, jsonBody('PATCH', { bogus: 1 }))).status).toBe(400);

    const issued = await call(statusRoute, '/x', { id: invoice!.id }, jsonBody('POST', { action: 'issue' }));
    expect(issued.body).toMatchObject({ status: 'issued' });
    expect(issued.body.issuedAt).toBeTruthy();
    expect((await call(patchRoute, '/x', { id: invoice!.id }, jsonBody('PATCH', { taxRatePct: 5 }))).status).toBe(409);
    expect((await call(statusRoute, '/x', { id: invoice!.id }, jsonBody('POST', { action: 'issue' }))).status).toBe(
      409,
    );
    expect((await call(statusRoute, '/x', { id: invoice!.id }, jsonBody('POST', { action: 'refund' }))).status).toBe(
      400,
    );

    await invoice!.reload();
    await invoice!.update({ status: 'paid' });
    expect((await call(statusRoute, '/x', { id: invoice!.id }, jsonBody('POST', { action: 'void' }))).status).toBe(409);
    await invoice!.update({ status: 'issued' });
    const voided = await call(
      statusRoute,
      '/x',
      { id: invoice!.id },
      jsonBody('POST', { action: 'void', reason: 'Wrong price' }),
    );
    expect(voided.body.status).toBe('void');
    // A voided invoice may be replaced; the new one gets its own number.
    const replacement = await call(createRoute, '/api/invoices', {}, jsonBody('POST', body()));
    expect(replacement.status).toBe(201);
    expect(replacement.body.number).toBe(`INV-${a.job.number}-2`);
  });

  it("answers 404 for another company's invoice on read, edit and status", async () => {
    const invoice = await Invoice.findOne({ where: { jobId: a.job.id, status: 'draft' } });
    await signInAs(b.office);
    expect((await call(getRoute, '/x', { id: invoice!.id })).status).toBe(404);
    expect((await call(patchRoute, '/x', { id: invoice!.id }, jsonBody('PATCH', { taxRatePct: 1 }))).status).toBe(404);
    expect((await call(statusRoute, '/x', { id: invoice!.id }, jsonBody('POST', { action: 'void' }))).status).toBe(404);
    expect((await Invoice.findByPk(invoice!.id))?.taxRateBp).toBe(825);
  });

  it('lists with paging, sorting by total, status filter and a CSV of the filter', async () => {
    await signInAs(a.office);
    for (const [index, price] of [300_00, 100_00, 200_00].entries()) {
      const job = await Job.create({
        companyId: a.company.id,
        number: `2026-L${index}${a.company.id.slice(0, 4)}`,
        customerId: a.customer.id,
        siteId: a.site.id,
        status: 'approved',
      });
      await Repair.create({
        companyId: a.company.id,
        jobId: job.id,
        segmentId: a.segment.id,
        distanceMm: 1000,
        defectType: 'hole',
        conditionGrade: 3,
        defectLengthMm: 100,
      });
      expect(
        (
          await call(
            createRoute,
            '/api/invoices',
            {},
            jsonBody('POST', body({ jobId: job.id, taxRatePct: 0, lines: [line({ unitPriceCents: price })] })),
          )
        ).status,
      ).toBe(201);
    }
    const page = await call(listRoute, '/api/invoices?sort=totalCents&pageSize=2&status=draft');
    expect(page.body).toMatchObject({ total: 4, page: 1, pageSize: 2 });
    expect(page.body.items.map((i: { totalCents: number }) => i.totalCents)).toEqual([100_00, 200_00]);
    const desc = await call(listRoute, '/api/invoices?sort=-totalCents&pageSize=1&status=draft');
    expect(desc.body.items[0].totalCents).toBe(227_325);
    expect((await call(listRoute, '/api/invoices?sort=secret')).status).toBe(400);
    const csv = await call(listRoute, '/api/invoices?format=csv&status=draft');
    const rows = String(csv.body)
      .replace(/^\uFEFF/, '')
      .trim()
      .split('\r\n');
    expect(rows[0]).toBe('Invoice,Job,Customer,Status,Currency,Subtotal,Tax,Total,Due,Paid at');
    expect(rows).toHaveLength(5);
    expect(rows.some((row) => row.includes(',300.00,0.00,300.00,'))).toBe(true);
  });
});
