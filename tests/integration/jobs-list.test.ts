import { describe, expect, it } from 'vitest';
import { listJobs } from '@/lib/data/jobs';
import { Crew, Customer, Job, Site } from '@/models';
import { makeWorld } from './helpers/world';

// The jobs list reads plain rows (no model instances) for speed: its items must be exactly what the model gives,
// a job without a crew included (null, not an object of nulls).
describe('the jobs list', () => {
  it('answers each job as the model reads it, with its customer, site and crew', async () => {
    const w = await makeWorld('Shape');
    await Job.create({
      companyId: w.company.id,
      customerId: w.customer.id,
      siteId: w.site.id,
      title: 'Not yet crewed',
      number: '2099-0001',
      status: 'draft',
    } as never);
    const office = {
      id: w.office.id,
      companyId: w.company.id,
      role: 'office' as const,
      name: 'o',
      email: 'o',
      crewIds: [],
    };
    const page = await listJobs(office, { page: 1, pageSize: 25, sort: 'number', dir: 'asc' } as never);
    const model = await Job.findAll({
      where: { companyId: w.company.id },
      include: [
        { model: Customer, as: 'customer', attributes: ['id', 'name'] },
        { model: Site, as: 'site', attributes: ['id', 'name', 'addressLine', 'city'] },
        { model: Crew, as: 'crew', attributes: ['id', 'name'] },
      ],
      order: [['number', 'ASC']],
    });
    const asJson = (value: unknown) => JSON.parse(JSON.stringify(value));
    expect(page.items.map((item) => item.crew === null)).toEqual([false, true]);
    expect(asJson(page.items)).toEqual(asJson(model.map((job) => job.get({ plain: true }))));
    expect(page).toMatchObject({ total: 2, pageCount: 1 });
  });
});
