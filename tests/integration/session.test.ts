import { beforeEach, describe, expect, it } from 'vitest';
import { GET as listJobsRoute } from '@/app/api/jobs/route';
import { requireUser } from '@/lib/auth/session';
import { AppError } from '@/lib/server/errors';
import { makeWorld, type World } from './helpers/world';
import { signInAs } from './helpers/session';
import { call } from './helpers/call';

describe('the session check reads the user row on every request', () => {
  let w: World;
  beforeEach(async () => {
    w = await makeWorld('Gamma');
  });

  it("refuses a deactivated user's existing session on the next request", async () => {
    await signInAs(w.technician);
    expect((await call(listJobsRoute, '/api/jobs')).status).toBe(200);
    await w.technician.update({ active: false });
    expect((await call(listJobsRoute, '/api/jobs')).status).toBe(401);
  });

  it('refuses a session once the token version moved on (signed out everywhere)', async () => {
    await signInAs(w.office);
    await w.office.increment('tokenVersion');
    expect((await call(listJobsRoute, '/api/jobs')).status).toBe(401);
  });

  it('applies a changed role on the next request', async () => {
    await signInAs(w.office);
    await expect(requireUser(['office'])).resolves.toMatchObject({ role: 'office' });
    await w.office.update({ role: 'technician' });
    const failure = await requireUser(['office', 'admin']).catch((e) => e);
    expect(failure).toBeInstanceOf(AppError);
    expect(failure.status).toBe(403);
  });

  it("carries the user's crews for crew-scoped checks", async () => {
    await signInAs(w.foreman);
    const user = await requireUser();
    expect(user.crewIds).toEqual([w.crew.id]);
    expect(user.companyId).toBe(w.company.id);
  });
});
