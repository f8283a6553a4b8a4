import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { GET as listRoute, POST as createRoute } from '@/app/api/jobs/route';
import { DELETE as archiveRoute, GET as getRoute, PATCH as patchRoute } from '@/app/api/jobs/[id]/route';
import { sequelize } from '@/lib/data/db';
import { AuditEntry, Customer, Job, Site } from '@/models';
import { makeWorld, type World } from './helpers/world';
import { signInAs, signOut } from './helpers/session';
import { call, jsonBody } from './helpers/call';

// The year a job made now is numbered in: the company's (America/Denver, see makeWorld) calendar year.
const yearNow = () =>
  new Intl.DateTimeFormat('en-CA', { timeZone: 'America/Denver', year: 'numeric' }).format(new Date());
const serial = (number: string) => Number(number.split('-')[1]);

/** A world whose own job is not numbered like the year's jobs, so the numbering starts where the test says. */
async function numberedWorld(name: string) {
  const w = await makeWorld(name);
  await w.job.update({ number: 'W-1' });
  return w;
}

const create = (body: unknown) => call(createRoute, '/api/jobs', {}, jsonBody('POST', body));
const patch = (id: string, body: unknown) => call(patchRoute, `/api/jobs/${id}`, { id }, jsonBody('PATCH', body));
const remove = (id: string) => call(archiveRoute, `/api/jobs/${id}`, { id }, { method: 'DELETE' });

describe('jobs API: create, edit, archive, numbering', () => {
  let a: World;
  let b: World;
  beforeAll(async () => {
    a = await makeWorld('Alpha');
    b = await makeWorld('Beta');
  });
  beforeEach(() => signOut());

  const jobCount = (w: World) => Job.count({ where: { companyId: w.company.id } });
  const base = (w: World, extra: Record<string, unknown> = {}) => ({
    customerId: w.customer.id,
    siteId: w.site.id,
    title: 'Fix the main',
    ...extra,
  });

  it('answers 401 without a session on every write', async () => {
    expect((await create(base(a))).status).toBe(401);
    expect((await patch(a.job.id, { title: 'x' })).status).toBe(401);
    expect((await remove(a.job.id)).status).toBe(401);
  });

  it('refuses bad input with 400 and a message per field, and writes nothing', async () => {
    await signInAs(a.office);
    const before = await jobCount(a);
    const bad = await create({ customerId: 'nope', siteId: '', title: '', scheduledDate: '2026-13-45', crewId: 'x' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual([
      'crewId',
      'customerId',
      'scheduledDate',
      'siteId',
      'title',
    ]);
    expect((await call(createRoute, '/api/jobs', {}, jsonBody('POST', '{"title":'))).status).toBe(400);
    expect((await call(createRoute, '/api/jobs', {}, { method: 'POST' })).status).toBe(400);
    expect(await jobCount(a)).toBe(before);
  });

  it('creates a draft, or a scheduled job when crew and day are given, numbered YYYY-NNNN, with an audit row', async () => {
    await signInAs(a.office);
    const draft = await create(base(a, { notes: 'Roots at 12 m' }));
    expect(draft.status).toBe(201);
    expect(draft.body).toMatchObject({
      status: 'draft',
      companyId: a.company.id,
      crewId: null,
      scheduledDate: null,
      notes: 'Roots at 12 m',
    });
    expect(draft.body.number).toMatch(new RegExp(`^${yearNow()}-\\d{4,}$`));
    const audit = await AuditEntry.findOne({ where: { entityId: draft.body.id, action: 'create' } });
    expect(audit).toMatchObject({ entityType: 'job', userId: a.office.id });
    expect(audit?.changes).toMatchObject({ number: draft.body.number, status: 'draft' });

    const scheduled = await create(base(a, { crewId: a.crew.id, scheduledDate: '2026-12-03' }));
    expect(scheduled.body).toMatchObject({ status: 'scheduled', crewId: a.crew.id, scheduledDate: '2026-12-03' });
    expect(serial(scheduled.body.number)).toBe(serial(draft.body.number) + 1);
    // A crew without a day (or the other way round) stays a draft.
    expect((await create(base(a, { crewId: a.crew.id, scheduledDate: '' }))).body.status).toBe('draft');
  });

  it('refuses a site of another customer, and another company’s customer, site or crew, with 422', async () => {
    await signInAs(a.office);
    const before = await jobCount(a);
    const otherCustomer = await Customer.create({ companyId: a.company.id, name: 'Other customer' });
    const wrongSite = await create(base(a, { customerId: otherCustomer.id }));
    expect(wrongSite.status).toBe(422);
    expect(wrongSite.body.error.fields).toHaveProperty('siteId');
    const foreignCustomer = await create(base(a, { customerId: b.customer.id, siteId: b.site.id }));
    expect(foreignCustomer.status).toBe(422);
    expect(foreignCustomer.body.error.fields).toHaveProperty('customerId');
    const foreignCrew = await create(base(a, { crewId: b.crew.id, scheduledDate: '2026-12-03' }));
    expect(foreignCrew.status).toBe(422);
    expect(foreignCrew.body.error.fields).toHaveProperty('crewId');
    expect(await jobCount(a)).toBe(before);
  });

  it('gives ten concurrent creates ten distinct, consecutive numbers', async () => {
    const w = await numberedWorld('Race');
    await signInAs(w.office);
    const answers = await Promise.all(Array.from({ length: 10 }, (_, i) => create(base(w, { title: `Race ${i}` }))));
    expect(answers.map((r) => r.status)).toEqual(Array(10).fill(201));
    const serials = answers.map((r) => serial(r.body.number)).sort((x, y) => x - y);
    expect(new Set(serials).size).toBe(10);
    expect(serials[9] - serials[0]).toBe(9);
    const [row] = await sequelize.query<{ last_number: number }>(
      'SELECT last_number FROM job_number_sequences WHERE company_id = :id',
      {
        replacements: { id: w.company.id },
        type: 'SELECT' as never,
      },
    );
    expect(row.last_number).toBe(serials[9]);
  });

  it('continues a seeded sequence and never reuses a number, even of a deleted or archived job', async () => {
    const w = await numberedWorld('Seq');
    const year = Number(yearNow());
    await sequelize.query('INSERT INTO job_number_sequences (company_id, year, last_number) VALUES (:id, :year, 15)', {
      replacements: { id: w.company.id, year },
    });
    await signInAs(w.office);
    const first = await create(base(w));
    expect(first.body.number).toBe(`${year}-0016`);
    expect((await remove(first.body.id)).body.deleted).toBe(true);
    const second = await create(base(w));
    expect(second.body.number).toBe(`${year}-0017`);
    await w.repair.update({ jobId: second.body.id });
    expect((await remove(second.body.id)).body.archived).toBe(true);
    expect((await create(base(w))).body.number).toBe(`${year}-0018`);
  });

  it('starts a company without a sequence row after the highest number of the year already used', async () => {
    const w = await numberedWorld('Fresh');
    const year = yearNow();
    await Job.create({ companyId: w.company.id, number: `${year}-0042`, customerId: w.customer.id, siteId: w.site.id });
    await signInAs(w.admin);
    expect((await create(base(w))).body.number).toBe(`${year}-0043`);
  });

  it('refuses writes by field roles with 403 and changes nothing', async () => {
    const before = await jobCount(a);
    for (const user of [a.foreman, a.technician]) {
      await signInAs(user);
      expect((await create(base(a))).status).toBe(403);
      expect((await patch(a.job.id, { title: 'Nope' })).status).toBe(403);
      expect((await remove(a.job.id)).status).toBe(403);
    }
    expect(await jobCount(a)).toBe(before);
    expect((await Job.findByPk(a.job.id))?.archivedAt).toBeNull();
  });

  it("answers 404 for another company's job on read, edit and archive", async () => {
    await signInAs(b.office);
    expect((await call(getRoute, '/x', { id: a.job.id })).status).toBe(404);
    expect((await patch(a.job.id, { title: 'Mine now' })).status).toBe(404);
    expect((await remove(a.job.id)).status).toBe(404);
    expect((await patch('not-a-uuid', { title: 'x' })).status).toBe(404);
    expect((await Job.findByPk(a.job.id))?.title).toBeNull();
  });

  it('edits title and notes, audits from/to, and refuses unknown fields with 400', async () => {
    await signInAs(a.office);
    const job = (await create(base(a))).body;
    const res = await patch(job.id, { title: 'Main line, two fractures', notes: 'Gate code 1234' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ title: 'Main line, two fractures', notes: 'Gate code 1234', status: 'draft' });
    const audit = await AuditEntry.findOne({ where: { entityId: job.id, action: 'update' } });
    expect(audit?.changes).toEqual({
      title: { from: 'Fix the main', to: 'Main line, two fractures' },
      notes: { from: null, to: 'Gate code 1234' },
    });
    const bad = await patch(job.id, { number: '1999-0001', companyId: b.company.id });
    expect(bad.status).toBe(400);
    expect((await Job.findByPk(job.id))?.number).toBe(job.number);
  });

  it('changes customer and site only while draft (409 after), and checks the pair (422)', async () => {
    await signInAs(a.office);
    const job = (await create(base(a))).body;
    const customer = await Customer.create({ companyId: a.company.id, name: 'Moved to' });
    const site = await Site.create({
      companyId: a.company.id,
      customerId: customer.id,
      name: 'New site',
      addressLine: '2 Other Road',
      city: 'Testville',
    });
    const mismatch = await patch(job.id, { customerId: customer.id });
    expect(mismatch.status).toBe(422);
    expect((await patch(job.id, { customerId: customer.id, siteId: site.id })).body).toMatchObject({
      customerId: customer.id,
      siteId: site.id,
    });
    expect((await patch(a.job.id, { customerId: customer.id, siteId: site.id })).status).toBe(409);
    expect((await Job.findByPk(a.job.id))?.siteId).toBe(a.site.id);
  });

  it('schedules a draft once crew and day are set, and unschedules it when either is cleared', async () => {
    await signInAs(a.office);
    const job = (await create(base(a))).body;
    expect((await patch(job.id, { crewId: a.crew.id })).body.status).toBe('draft');
    expect((await patch(job.id, { scheduledDate: '2026-12-09' })).body.status).toBe('scheduled');
    expect((await patch(job.id, { crewId: null })).body).toMatchObject({ status: 'draft', crewId: null });
    const audit = await AuditEntry.findAll({
      where: { entityId: job.id, action: 'update' },
      order: [['createdAt', 'ASC']],
    });
    expect(audit.at(-1)?.changes).toEqual({
      crewId: { from: a.crew.id, to: null },
      status: { from: 'scheduled', to: 'draft' },
    });
  });

  it('makes only the office’s sensible status moves: 409 for the others, 422 to schedule without crew and day', async () => {
    await signInAs(a.office);
    const job = (await create(base(a))).body;
    const early = await patch(job.id, { status: 'scheduled' });
    expect(early.status).toBe(422);
    expect(early.body.error.fields).toHaveProperty('status');
    expect((await patch(job.id, { status: 'approved' })).status).toBe(409);
    expect((await patch(job.id, { status: 'cancelled' })).body.status).toBe('cancelled');
    expect((await patch(job.id, { status: 'closed' })).status).toBe(409);
    expect((await patch(job.id, { status: 'draft' })).body.status).toBe('draft');

    const running = await Job.create({
      companyId: a.company.id,
      number: 'T-RUN',
      customerId: a.customer.id,
      siteId: a.site.id,
      status: 'in_progress',
      crewId: a.crew.id,
      scheduledDate: '2026-12-01',
    });
    expect((await patch(running.id, { status: 'cancelled' })).status).toBe(409);
    expect((await patch(running.id, { scheduledDate: '2026-12-02' })).status).toBe(409);
    const approved = await Job.create({
      companyId: a.company.id,
      number: 'T-APP',
      customerId: a.customer.id,
      siteId: a.site.id,
      status: 'approved',
    });
    expect((await patch(approved.id, { status: 'closed' })).body.status).toBe('closed');
    expect((await patch('00000000-0000-4000-8000-000000000000', { status: 'closed' })).status).toBe(404);
    expect((await Job.findByPk(running.id))?.status).toBe('in_progress');
  });

  it('archives a job with repairs (kept, number kept, hidden from the list) and deletes an empty one', async () => {
    await signInAs(a.office);
    const res = await remove(a.job.id);
    expect(res.body).toEqual({ id: a.job.id, archived: true, deleted: false });
    expect((await Job.findByPk(a.job.id))?.archivedAt).toBeInstanceOf(Date);
    expect(await AuditEntry.count({ where: { entityId: a.job.id, action: 'archive' } })).toBe(1);
    expect((await patch(a.job.id, { title: 'Too late' })).status).toBe(409);
    const list = await call(listRoute, '/api/jobs?pageSize=100');
    expect(list.body.items.some((j: { id: string }) => j.id === a.job.id)).toBe(false);
    const only = await call(listRoute, '/api/jobs?archived=only');
    expect(only.body.items.map((j: { id: string }) => j.id)).toEqual([a.job.id]);

    const empty = (await create(base(a))).body;
    expect((await remove(empty.id)).body).toEqual({ id: empty.id, archived: false, deleted: true });
    expect(await Job.findByPk(empty.id)).toBeNull();
    expect(await AuditEntry.count({ where: { entityId: empty.id, action: 'delete' } })).toBe(1);
  });
});

describe('jobs list: the common list contract', () => {
  let w: World;
  beforeAll(async () => {
    w = await makeWorld('List');
    const row = (
      number: string,
      status: 'draft' | 'scheduled' | 'closed',
      scheduledDate: string | null,
      title: string,
      crewId: string | null = null,
    ) => ({
      companyId: w.company.id,
      customerId: w.customer.id,
      siteId: w.site.id,
      number,
      status,
      scheduledDate,
      title,
      crewId,
    });
    await Job.bulkCreate([
      row('2026-0101', 'draft', null, 'Lateral roots'),
      row('2026-0102', 'scheduled', '2026-12-05', 'Cracked main', w.otherCrew.id),
      row('2026-0103', 'scheduled', '2026-12-07', 'Offset joint', w.crew.id),
      row('2026-0104', 'closed', '2026-11-20', 'Old fracture', w.crew.id),
    ]);
    await w.job.update({ number: '2026-0199' });
  });
  beforeEach(() => signOut());

  const numbers = (body: { items: { number: string }[] }) => body.items.map((j) => j.number);

  it('pages and sorts ascending and descending, answering { items, total, page, pageSize, pageCount }', async () => {
    await signInAs(w.office);
    const first = await call(listRoute, '/api/jobs?pageSize=2&sort=number');
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ total: 5, page: 1, pageSize: 2, pageCount: 3 });
    expect(numbers(first.body)).toEqual(['2026-0101', '2026-0102']);
    const second = await call(listRoute, '/api/jobs?pageSize=2&page=2&sort=number');
    expect(numbers(second.body)).toEqual(['2026-0103', '2026-0104']);
    const desc = await call(listRoute, '/api/jobs?pageSize=2&sort=-scheduledDate');
    expect(numbers(desc.body)).toEqual(['2026-0103', '2026-0102']);
    const dir = await call(listRoute, '/api/jobs?pageSize=1&sort=scheduledDate&dir=asc');
    expect(numbers(dir.body)).toEqual(['2026-0104']);
    // The count rides on the rows (a window count): a row carries no trace of it, and a page past the end, with no
    // row to carry it, still says how many there are.
    expect(Object.keys(first.body.items[0])).not.toContain('matchCount');
    const past = await call(listRoute, '/api/jobs?pageSize=2&page=9&sort=number');
    expect(past.body).toMatchObject({ items: [], total: 5, page: 9, pageCount: 3 });
    expect((await call(listRoute, '/api/jobs?pageSize=2&page=9&q=offset')).body.total).toBe(1);
  });

  it('keeps its filters: q, status (a comma list), crewId, from and to', async () => {
    await signInAs(w.office);
    const searched = (await call(listRoute, '/api/jobs?q=offset')).body;
    expect(numbers(searched)).toEqual(['2026-0103']);
    // The count reads the customer and site the search reads.
    expect(searched.total).toBe(1);
    expect(numbers((await call(listRoute, '/api/jobs?q=0104')).body)).toEqual(['2026-0104']);
    expect((await call(listRoute, '/api/jobs?status=scheduled,closed&sort=number')).body.total).toBe(4);
    expect(numbers((await call(listRoute, `/api/jobs?crewId=${w.otherCrew.id}`)).body)).toEqual(['2026-0102']);
    expect(numbers((await call(listRoute, '/api/jobs?from=2026-12-02&to=2026-12-06')).body)).toEqual(['2026-0102']);
  });

  it('refuses an unknown sort key, a bad status or date with 400 and field messages', async () => {
    await signInAs(w.office);
    const { status, body } = await call(listRoute, '/api/jobs?sort=password&from=yesterday&archived=maybe');
    expect(status).toBe(400);
    expect(Object.keys(body.error.fields)).toEqual(expect.arrayContaining(['sort', 'from', 'archived']));
  });

  it('exports every row the filter matches as CSV', async () => {
    await signInAs(w.office);
    const { status, body } = await call(listRoute, '/api/jobs?format=csv&status=scheduled&pageSize=1&sort=number');
    expect(status).toBe(200);
    const lines = String(body)
      .replace(/^\uFEFF/, '')
      .trim()
      .split('\r\n');
    expect(lines[0]).toBe('Number,Title,Customer,Site,City,Status,Scheduled,Crew,Archived');
    expect(lines.slice(1).map((line) => line.split(',')[0])).toEqual(['2026-0102', '2026-0103', '2026-0199']);
  });

  it('shows field users only their crews’ jobs', async () => {
    await signInAs(w.foreman);
    const mine = await call(listRoute, '/api/jobs?sort=number&pageSize=100');
    expect(numbers(mine.body).sort()).toEqual(['2026-0103', '2026-0104', '2026-0199']);
    await signInAs(w.otherTechnician);
    expect(numbers((await call(listRoute, '/api/jobs')).body)).toEqual(['2026-0102']);
    const someoneElses = await Job.findOne({ where: { companyId: w.company.id, number: '2026-0103' } });
    expect((await call(getRoute, '/x', { id: someoneElses!.id })).status).toBe(404);
  });
});
