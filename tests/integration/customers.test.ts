import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { GET as listRoute, POST as createRoute } from '@/app/api/customers/route';
import { DELETE as archiveRoute, GET as getRoute, PATCH as patchRoute } from '@/app/api/customers/[id]/route';
import { AuditEntry, Customer } from '@/models';
import { makeWorld, type World } from './helpers/world';
import { signInAs, signOut } from './helpers/session';
import { call, jsonBody } from './helpers/call';

describe('customers API', () => {
  let a: World;
  let b: World;
  beforeAll(async () => {
    a = await makeWorld('Alpha');
    b = await makeWorld('Beta');
    // Five more customers so paging and sorting have something to do.
    await Customer.bulkCreate(
      ['Echo', 'Delta', 'Charlie', 'Bravo', 'Able'].map((name) => ({
        companyId: a.company.id,
        name: `${name} Homes`,
        kind: 'business' as const,
      })),
    );
  });
  beforeEach(() => signOut());

  const count = () => Customer.count({ where: { companyId: a.company.id } });

  it('answers 401 without a session', async () => {
    expect((await call(listRoute, '/api/customers')).status).toBe(401);
    expect((await call(createRoute, '/api/customers', {}, jsonBody('POST', { name: 'X' }))).status).toBe(401);
  });

  it('pages and sorts, ascending and descending, and answers { items, total, page, pageSize }', async () => {
    await signInAs(a.office);
    const first = await call(listRoute, '/api/customers?pageSize=2&sort=name');
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ total: 6, page: 1, pageSize: 2 });
    expect(first.body.items.map((c: { name: string }) => c.name)).toEqual(['Able Homes', 'Bravo Homes']);
    const third = await call(listRoute, '/api/customers?pageSize=2&page=3&sort=name');
    expect(third.body.items.map((c: { name: string }) => c.name)).toEqual(['Delta Homes', 'Echo Homes']);
    const desc = await call(listRoute, '/api/customers?pageSize=1&sort=-name');
    expect(desc.body.items[0].name).toBe('Echo Homes');
    const searched = await call(listRoute, '/api/customers?q=charl');
    expect(searched.body.items.map((c: { name: string }) => c.name)).toEqual(['Charlie Homes']);
    const kind = await call(listRoute, '/api/customers?kind=business');
    expect(kind.body.total).toBe(5);
  });

  it('refuses an unknown sort key or page 0 with 400 and field messages', async () => {
    await signInAs(a.office);
    const { status, body } = await call(listRoute, '/api/customers?sort=password&page=0');
    expect(status).toBe(400);
    expect(Object.keys(body.error.fields)).toEqual(expect.arrayContaining(['sort', 'page']));
  });

  it('exports the current filter as CSV, every row, not one page', async () => {
    await signInAs(a.office);
    const { status, body } = await call(listRoute, '/api/customers?format=csv&kind=business&pageSize=1');
    expect(status).toBe(200);
    const lines = String(body)
      .replace(/^\uFEFF/, '')
      .trim()
      .split('\r\n');
    expect(lines[0]).toBe('Name,Kind,Contact,E-mail,Phone,Billing address,Archived');
    expect(lines).toHaveLength(6);
  });

  it('creates a customer, writes the audit trail, and refuses bad input with field messages and nothing written', async () => {
    await signInAs(a.office);
    const before = await count();
    const bad = await call(
      createRoute,
      '/api/customers',
      {},
      jsonBody('POST', { name: '', email: 'not-mail', kind: 'alien' }),
    );
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['email', 'kind', 'name']);
    expect((await call(createRoute, '/api/customers', {}, jsonBody('POST', '{nope'))).status).toBe(400);
    expect(await count()).toBe(before);

    const made = await call(
      createRoute,
      '/api/customers',
      {},
      jsonBody('POST', { name: ' Foxglove Flats ', email: 'Desk@Foxglove.test', kind: 'property_manager' }),
    );
    expect(made.status).toBe(201);
    expect(made.body).toMatchObject({ name: 'Foxglove Flats', email: 'desk@foxglove.test', companyId: a.company.id });
    const audit = await AuditEntry.findOne({ where: { entityId: made.body.id } });
    expect(audit).toMatchObject({ action: 'create', entityType: 'customer', userId: a.office.id });
  });

  it('refuses writes by field roles with 403 and changes nothing', async () => {
    for (const user of [a.foreman, a.technician]) {
      await signInAs(user);
      expect((await call(createRoute, '/api/customers', {}, jsonBody('POST', { name: 'Nope' }))).status).toBe(403);
      expect((await call(patchRoute, '/x', { id: a.customer.id }, jsonBody('PATCH', { name: 'Nope' }))).status).toBe(
        403,
      );
      expect((await call(archiveRoute, '/x', { id: a.customer.id }, { method: 'DELETE' })).status).toBe(403);
    }
    expect((await Customer.findByPk(a.customer.id))?.name).toBe(a.customer.name);
  });

  it('lets field users read only the customers of their crews’ jobs', async () => {
    await signInAs(a.foreman);
    const list = await call(listRoute, '/api/customers');
    expect(list.body.items.map((c: { id: string }) => c.id)).toEqual([a.customer.id]);
    expect((await call(getRoute, '/x', { id: a.customer.id })).status).toBe(200);
    const other = await Customer.findOne({ where: { companyId: a.company.id, name: 'Able Homes' } });
    expect((await call(getRoute, '/x', { id: other!.id })).status).toBe(404);
    await signInAs(a.otherTechnician);
    expect((await call(listRoute, '/api/customers')).body.total).toBe(0);
  });

  it('edits with PATCH: only the fields sent change, each change is audited with from and to', async () => {
    await signInAs(a.office);
    const c = await Customer.create({
      companyId: a.company.id,
      name: 'Gorse Lane',
      kind: 'municipality',
      phone: '555-0101',
    });
    const res = await call(patchRoute, '/x', { id: c.id }, jsonBody('PATCH', { phone: '555-0199' }));
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ name: 'Gorse Lane', kind: 'municipality', phone: '555-0199' });
    const audit = await AuditEntry.findOne({ where: { entityId: c.id, action: 'update' } });
    expect(audit?.changes).toEqual({ phone: { from: '555-0101', to: '555-0199' } });
    const bad = await call(patchRoute, '/x', { id: c.id }, jsonBody('PATCH', { name: '', companyId: b.company.id }));
    expect(bad.status).toBe(400);
    expect((await Customer.findByPk(c.id))?.companyId).toBe(a.company.id);
  });

  it("answers 404 for another company's customer on read, edit and archive", async () => {
    await signInAs(b.office);
    expect((await call(getRoute, '/x', { id: a.customer.id })).status).toBe(404);
    expect((await call(patchRoute, '/x', { id: a.customer.id }, jsonBody('PATCH', { name: 'Mine now' }))).status).toBe(
      404,
    );
    expect((await call(archiveRoute, '/x', { id: a.customer.id }, { method: 'DELETE' })).status).toBe(404);
    expect((await call(getRoute, '/x', { id: 'not-a-uuid' })).status).toBe(404);
    expect((await Customer.findByPk(a.customer.id))?.archivedAt).toBeNull();
  });

  it('archives a customer with sites and jobs (kept, hidden from the list) and deletes one with nothing', async () => {
    await signInAs(a.office);
    const res = await call(archiveRoute, '/x', { id: a.customer.id }, { method: 'DELETE' });
    expect(res.body).toEqual({ id: a.customer.id, archived: true, deleted: false });
    expect((await Customer.findByPk(a.customer.id))?.archivedAt).toBeInstanceOf(Date);
    const list = await call(listRoute, '/api/customers?pageSize=100');
    expect(list.body.items.some((c: { id: string }) => c.id === a.customer.id)).toBe(false);
    const archived = await call(listRoute, '/api/customers?archived=only');
    expect(archived.body.items.map((c: { id: string }) => c.id)).toEqual([a.customer.id]);

    const lonely = await Customer.create({ companyId: a.company.id, name: 'Heather Row' });
    expect((await call(archiveRoute, '/x', { id: lonely.id }, { method: 'DELETE' })).body.deleted).toBe(true);
    expect(await Customer.findByPk(lonely.id)).toBeNull();
    expect(await AuditEntry.count({ where: { entityId: lonely.id, action: 'delete' } })).toBe(1);
  });
});
