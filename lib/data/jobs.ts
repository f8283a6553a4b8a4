import 'server-only';
import { Op, type InferAttributes, type Model, type Order, type WhereOptions } from 'sequelize';
import { AccessPoint, Crew, Customer, Job, Repair, Segment, Site } from '@/models';
import type { SessionUser } from '@/lib/auth/session';
import type { JobListQuery } from '@/lib/validation/jobs';

type Plain<M extends Model> = InferAttributes<M>;

export type JobListItem = Plain<Job> & {
  customer: Pick<Plain<Customer>, 'id' | 'name'> | null;
  site: Pick<Plain<Site>, 'id' | 'name' | 'addressLine' | 'city'> | null;
  crew: Pick<Plain<Crew>, 'id' | 'name'> | null;
};

export type JobDetail = Plain<Job> & {
  customer: Plain<Customer>;
  site: Plain<Site> & { accessPoints: Plain<AccessPoint>[]; segments: Plain<Segment>[] };
  crew: Pick<Plain<Crew>, 'id' | 'name'> | null;
  repairs: (Plain<Repair> & { segment: Plain<Segment> })[];
};

/** A page of the caller's company's jobs, filtered and sorted as asked. */
export async function listJobs(user: SessionUser, query: JobListQuery) {
  const where: WhereOptions<Job> = { companyId: user.companyId, archivedAt: null };
  const and: WhereOptions<Job>[] = [];
  if (query.status?.length) and.push({ status: { [Op.in]: query.status } });
  if (query.crewId) and.push({ crewId: query.crewId });
  if (query.from) and.push({ scheduledDate: { [Op.gte]: query.from } });
  if (query.to) and.push({ scheduledDate: { [Op.lte]: query.to } });
  if (query.q) {
    const like = `%${query.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    and.push({
      [Op.or]: [
        { number: { [Op.iLike]: like } },
        { title: { [Op.iLike]: like } },
        { '$customer.name$': { [Op.iLike]: like } },
        { '$site.address_line$': { [Op.iLike]: like } },
      ],
    });
  }
  const order: Order = [[query.sort, query.dir.toUpperCase()], ['number', 'DESC']];
  const { rows, count } = await Job.findAndCountAll({
    where: and.length ? { [Op.and]: [where, ...and] } : where,
    include: [
      { model: Customer, as: 'customer', attributes: ['id', 'name'] },
      { model: Site, as: 'site', attributes: ['id', 'name', 'addressLine', 'city'] },
      { model: Crew, as: 'crew', attributes: ['id', 'name'] },
    ],
    order,
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
    distinct: true,
  });
  return {
    items: rows.map((row) => row.get({ plain: true }) as JobListItem),
    page: query.page,
    pageSize: query.pageSize,
    total: count,
    pageCount: Math.max(1, Math.ceil(count / query.pageSize)),
  };
}

/** One job of the caller's company with its site, customer, crew and repairs; null when it is not theirs. */
export async function getJob(user: SessionUser, id: string) {
  const job = await Job.findOne({
    where: { id, companyId: user.companyId },
    include: [
      { model: Customer, as: 'customer' },
      {
        model: Site,
        as: 'site',
        include: [
          { model: AccessPoint, as: 'accessPoints' },
          { model: Segment, as: 'segments' },
        ],
      },
      { model: Crew, as: 'crew', attributes: ['id', 'name'] },
      { model: Repair, as: 'repairs', include: [{ model: Segment, as: 'segment' }] },
    ],
    order: [
      [{ model: Repair, as: 'repairs' }, 'position', 'ASC'],
      [{ model: Site, as: 'site' }, { model: AccessPoint, as: 'accessPoints' }, 'label', 'ASC'],
    ],
  });
  return job ? (job.get({ plain: true }) as JobDetail) : null;
}
