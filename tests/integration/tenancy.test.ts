import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { GET as getJobRoute } from '@/app/api/jobs/[id]/route';
import { GET as listJobsRoute } from '@/app/api/jobs/route';
import { getJob, listJobs } from '@/lib/data/jobs';
import { userFromClaims } from '@/lib/auth/session';
import { makeWorld, type World } from './helpers/world';
import { signInAs, signOut } from './helpers/session';
import { call } from './helpers/call';

describe('jobs API and tenant isolation', () => {
  let a: World;
  let b: World;
  beforeAll(async () => {
    a = await makeWorld('Alpha');
    b = await makeWorld('Beta');
  });
  beforeEach(() => signOut());

  it('answers 401 without a session', async () => {
    expect((await call(listJobsRoute, '/api/jobs')).status).toBe(401);
    expect((await call(getJobRoute, `/api/jobs/${a.job.id}`, { id: a.job.id })).status).toBe(401);
  });

  it("lists only the caller's company's jobs, paginated", async () => {
    await signInAs(a.office);
    const { status, body } = await call(listJobsRoute, '/api/jobs?pageSize=10');
    expect(status).toBe(200);
    expect(body.items.map((j: { id: string }) => j.id)).toEqual([a.job.id]);
    expect(body).toMatchObject({ page: 1, pageSize: 10, total: 1, pageCount: 1 });
  });

  it('gives a job with its site, customer and repairs', async () => {
    await signInAs(a.foreman);
    const { status, body } = await call(getJobRoute, `/api/jobs/${a.job.id}`, { id: a.job.id });
    expect(status).toBe(200);
    expect(body.site.id).toBe(a.site.id);
    expect(body.customer.id).toBe(a.customer.id);
    expect(body.repairs.map((r: { id: string }) => r.id)).toEqual([a.repair.id]);
  });

  it("answers 404 for another company's job, and for an id that is not a UUID", async () => {
    await signInAs(b.admin);
    expect((await call(getJobRoute, `/api/jobs/${a.job.id}`, { id: a.job.id })).status).toBe(404);
    expect((await call(getJobRoute, '/api/jobs/nope', { id: 'nope' })).status).toBe(404);
    const list = await call(listJobsRoute, '/api/jobs');
    expect(list.body.items.some((j: { id: string }) => j.id === a.job.id)).toBe(false);
  });

  it('refuses a malformed query with 400 and a message', async () => {
    await signInAs(a.office);
    const { status, body } = await call(listJobsRoute, '/api/jobs?page=0&status=nonsense');
    expect(status).toBe(400);
    expect(body.error.message).toMatch(/page|status/);
    const fields = Object.keys(body.error.fields);
    expect(fields).toContain('page');
    expect(fields.some((key) => key.startsWith('status'))).toBe(true);
  });

  it('scopes the data layer itself: a user of one company reads nothing of the other', async () => {
    const asB = await userFromClaims({ sub: b.office.id, companyId: b.company.id, role: 'office', tokenVersion: 0 });
    expect(asB).not.toBeNull();
    expect(await getJob(asB!, a.job.id)).toBeNull();
    const page = await listJobs(asB!, { page: 1, pageSize: 100, sort: 'number', dir: 'asc' });
    expect(page.items.every((j) => j.companyId === b.company.id)).toBe(true);
  });

  it('refuses claims that pair a user with another company', async () => {
    expect(
      await userFromClaims({ sub: a.office.id, companyId: b.company.id, role: 'office', tokenVersion: 0 }),
    ).toBeNull();
  });
});
