import 'server-only';
import type { InferAttributes } from 'sequelize';
import type { z } from 'zod';
import { AccessPoint, Customer, Job, Segment, Site } from '@/models';
import { sequelize } from '@/lib/data/db';
import { recordAudit } from '@/lib/data/audit';
import { AppError, notFound } from '@/lib/server/errors';
import type { SessionUser } from '@/lib/auth/session';
import type { SiteListQuery, siteInputSchema, sitePatchSchema } from '@/lib/validation/sites';
import { allOf, archivedWhere, pageOf, searchWhere, windowOf } from './list';
import { assertOfficeWriter, crewJobsWhere } from './scope';
import { archiveOrDelete, lockOwnRow, updateAudited } from './records';

const ENTITY = 'site';

type Plain<T extends Site | Customer | AccessPoint | Segment> = InferAttributes<T>;
export type SiteListItem = Plain<Site> & { customer: Pick<Plain<Customer>, 'id' | 'name'> | null };
export type SiteDetail = Plain<Site> & {
  customer: Plain<Customer>;
  accessPoints: Plain<AccessPoint>[];
  segments: Plain<Segment>[];
};

export type SiteListResponse = Awaited<ReturnType<typeof listSites>>;

/** A page of the caller's sites (field users: only those of their crews' jobs). */
export async function listSites(user: SessionUser, query: SiteListQuery, exportAll = false) {
  const where = allOf(
    { companyId: user.companyId },
    archivedWhere(query.archived),
    query.customerId ? { customerId: query.customerId } : undefined,
    searchWhere(query.q, ['name', 'addressLine', 'city']),
    siteScope(user),
  );
  const { rows, count } = await Site.findAndCountAll({
    where,
    include: [{ model: Customer, as: 'customer', attributes: ['id', 'name'] }],
    order: [
      [query.sort, query.dir.toUpperCase()],
      ['id', 'ASC'],
    ],
    ...windowOf(query, exportAll),
  });
  return pageOf(
    rows.map((row) => row.get({ plain: true }) as SiteListItem),
    count,
    query,
  );
}

export type SiteResponse = Awaited<ReturnType<typeof getSite>>;

/** One site with its customer, access points and segments; 404 when it is not the caller's to see. */
export async function getSite(user: SessionUser, id: string): Promise<SiteDetail> {
  const site = await Site.findOne({
    where: allOf({ id, companyId: user.companyId }, siteScope(user)),
    include: [
      { model: Customer, as: 'customer' },
      { model: AccessPoint, as: 'accessPoints', required: false },
      { model: Segment, as: 'segments', required: false },
    ],
    order: [
      [{ model: AccessPoint, as: 'accessPoints' }, 'label', 'ASC'],
      [{ model: Segment, as: 'segments' }, 'label', 'ASC'],
    ],
  });
  if (!site) throw notFound('Site');
  return site.get({ plain: true }) as SiteDetail;
}

/** The site row itself when the caller may read it (for the access point and segment routes). */
export async function findVisibleSite(user: SessionUser, id: string) {
  const site = await Site.findOne({ where: allOf({ id, companyId: user.companyId }, siteScope(user)) });
  if (!site) throw notFound('Site');
  return site;
}

/** Customers a new site can belong to, for the form's select. */
export async function listCustomerChoices(user: SessionUser) {
  assertOfficeWriter(user);
  const rows = await Customer.findAll({
    where: { companyId: user.companyId, archivedAt: null },
    attributes: ['id', 'name'],
    order: [['name', 'ASC']],
  });
  return rows.map((row) => ({ id: row.id, name: row.name }));
}

export async function createSite(user: SessionUser, input: z.output<typeof siteInputSchema>) {
  assertOfficeWriter(user);
  return sequelize.transaction(async (transaction) => {
    // Another company's customer gets the same answer as one that does not exist.
    const customer = await Customer.findOne({
      where: { id: input.customerId, companyId: user.companyId },
      transaction,
    });
    if (!customer)
      throw new AppError(422, 'That customer was not found.', { customerId: ['Pick one of your customers'] });
    if (customer.archivedAt)
      throw new AppError(422, 'That customer is archived.', {
        customerId: ['This customer is archived: restore it or pick another'],
      });
    const site = await Site.create({ ...input, companyId: user.companyId }, { transaction });
    await recordAudit(user, { action: 'create', entityType: ENTITY, entityId: site.id, changes: input }, transaction);
    return site.get({ plain: true });
  });
}

export async function updateSite(user: SessionUser, id: string, patch: z.output<typeof sitePatchSchema>) {
  assertOfficeWriter(user);
  return sequelize.transaction(async (transaction) => {
    const site = await lockOwnRow(Site, user, id, 'Site', transaction);
    return updateAudited(user, site, ENTITY, patch, transaction);
  }) as Promise<InferAttributes<Site>>;
}

/**
 * Archives a site that has segments or jobs (their history must stay readable) and deletes one that
 * has neither; its access points go with it (ON DELETE CASCADE).
 */
export async function archiveSite(user: SessionUser, id: string, reason?: string | null) {
  assertOfficeWriter(user);
  return sequelize.transaction(async (transaction) => {
    const site = await lockOwnRow(Site, user, id, 'Site', transaction);
    const [segments, jobs] = await Promise.all([
      Segment.count({ where: { siteId: id, companyId: user.companyId }, transaction }),
      Job.count({ where: { siteId: id, companyId: user.companyId }, transaction }),
    ]);
    return archiveOrDelete(
      user,
      site,
      { entityType: ENTITY, inUse: segments + jobs > 0, summary: { name: site.name }, reason },
      transaction,
    );
  });
}

/** Field users read only the sites their crews' jobs are at; desk users the whole company. */
const siteScope = (user: SessionUser) => crewJobsWhere(user, 'id', 'site_id');
