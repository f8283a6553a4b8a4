import { randomUUID } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import { Install, InstallEvent, Job, Repair, sequelize } from '@/models';
import { makeWorld, type World } from './helpers/world';

describe('database constraints', () => {
  let a: World;
  let b: World;
  beforeAll(async () => {
    a = await makeWorld('Alpha');
    b = await makeWorld('Beta');
  });

  const jobFor = (w: World, number: string, status = 'draft') =>
    Job.create(
      { companyId: w.company.id, number, customerId: w.customer.id, siteId: w.site.id, status: status as never },
      { validate: false },
    );

  it('keeps job numbers unique per company, not across companies', async () => {
    const number = `U-${randomUUID().slice(0, 8)}`;
    await jobFor(a, number);
    await expect(jobFor(b, number)).resolves.toBeTruthy();
    await expect(jobFor(a, number)).rejects.toMatchObject({ name: 'SequelizeUniqueConstraintError' });
  });

  it('refuses a status the product does not know', async () => {
    await expect(jobFor(a, `S-${randomUUID().slice(0, 8)}`, 'finished-ish')).rejects.toThrow(/jobs_status_check/);
    await expect(
      sequelize.query(`UPDATE users SET role = 'owner' WHERE id = :id`, { replacements: { id: a.office.id } }),
    ).rejects.toThrow(/users_role_check/);
  });

  it('refuses a condition grade outside 1–5 and a repair on a missing segment', async () => {
    const base = {
      companyId: a.company.id,
      jobId: a.job.id,
      distanceMm: 100,
      defectType: 'hole' as const,
      defectLengthMm: 50,
    };
    await expect(
      Repair.create({ ...base, segmentId: a.segment.id, conditionGrade: 6 }, { validate: false }),
    ).rejects.toThrow(/repairs_grade_check/);
    await expect(Repair.create({ ...base, segmentId: randomUUID(), conditionGrade: 3 })).rejects.toThrow(
      /foreign key/i,
    );
  });

  it('keeps client event ids unique per company and the event log append-only', async () => {
    const installA = await Install.create({
      companyId: a.company.id,
      repairId: a.repair.id,
      jobId: a.job.id,
      crewId: a.crew.id,
    });
    const installB = await Install.create({
      companyId: b.company.id,
      repairId: b.repair.id,
      jobId: b.job.id,
      crewId: b.crew.id,
    });
    const clientEventId = randomUUID();
    const event = (w: World, installId: string) =>
      InstallEvent.create({
        companyId: w.company.id,
        installId,
        clientEventId,
        type: 'resin_mixed',
        deviceTime: new Date(),
        userId: w.foreman.id,
      });
    const first = await event(a, installA.id);
    await expect(event(b, installB.id)).resolves.toBeTruthy();
    await expect(event(a, installA.id)).rejects.toMatchObject({ name: 'SequelizeUniqueConstraintError' });
    await expect(first.update({ type: 'note' })).rejects.toThrow(/append-only/);
  });

  it('refuses a correction that names no event', async () => {
    const install = await Install.create({ companyId: a.company.id, repairId: a.repair.id, jobId: a.job.id });
    await expect(
      InstallEvent.create({
        companyId: a.company.id,
        installId: install.id,
        clientEventId: randomUUID(),
        type: 'correction',
        deviceTime: new Date(),
        userId: a.foreman.id,
      }),
    ).rejects.toThrow(/install_events_correction_check/);
  });
});
