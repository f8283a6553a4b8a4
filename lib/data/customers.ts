import 'server-only';
import type { InferAttributes } from 'sequelize';
import { Customer, Job, Site } from '@/models';
import { sequelize } from '@/lib/db';
import { changedFields, recordAudit } from '@/lib/audit';
import { notFound } from '@/lib/errors';
import type { SessionUser } from '@/lib/auth/session';
import type { CustomerListQuery, customerInputSchema, customerPatchSchema } from '@/lib/validation/customers';
import type { z } from 'zod';
import { allOf, archivedWhere, pageOf, searchWhere, windowOf } from './list';
import { assertOfficeWriter, crewJobsWhere } from './scope';

const ENTITY = 'customer';

/** A page of the caller's customers (field users: only those of their crews' jobs). */
export async function listCustomers(user: SessionUser, query: CustomerListQuery, exportAll = false) {
  const where = allOf(
    { companyId: user.companyId },
    archivedWhere(query.archived),
    query.kind ? { kind: query.kind } : undefined,
    searchWhere(query.q, ['name', 'contactName', 'email', 'phone']),
    crewJobsWhere(user, 'id', 'customer_id'),
  );
  const { rows, count } = await Customer.findAndCountAll({
    where,
    order: [[query.sort, query.dir.toUpperCase()], ['id', 'ASC']],
    ...windowOf(query, exportAll),
  });
  return pageOf(rows.map((row) => row.get({ plain: true })), count, query);
}

/** One customer with its sites; throws 404 when it is not the caller's to see. */
export async function getCustomer(user: SessionUser, id: string) {
  const customer = await Customer.findOne({
    where: allOf({ id, companyId: user.companyId }, crewJobsWhere(user, 'id', 'customer_id')),
    include: [{ model: Site, as: 'sites', required: false }],
    order: [[{ model: Site, as: 'sites' }, 'name', 'ASC']],
  });
  if (!customer) throw notFound('Customer');
  return customer.get({ plain: true }) as InferAttributes<Customer> & { sites: InferAttributes<Site>[] };
}

export async function createCustomer(user: SessionUser, input: z.output<typeof customerInputSchema>) {
  assertOfficeWriter(user);
  return sequelize.transaction(async (transaction) => {
    const customer = await Customer.create({ ...input, companyId: user.companyId }, { transaction });
    await recordAudit(user, { action: 'create', entityType: ENTITY, entityId: customer.id, changes: input }, transaction);
    return customer.get({ plain: true });
  });
}

export async function updateCustomer(user: SessionUser, id: string, patch: z.output<typeof customerPatchSchema>) {
  assertOfficeWriter(user);
  return sequelize.transaction(async (transaction) => {
    const customer = await Customer.findOne({ where: { id, companyId: user.companyId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!customer) throw notFound('Customer');
    const changes = changedFields(customer.get({ plain: true }), patch);
    if (Object.keys(changes).length) {
      await customer.update(patch, { transaction });
      await recordAudit(user, { action: 'update', entityType: ENTITY, entityId: id, changes }, transaction);
    }
    return customer.get({ plain: true });
  });
}

/**
 * Archives a customer that has sites or jobs (history must stay readable) and deletes one that has none.
 */
export async function archiveCustomer(user: SessionUser, id: string, reason?: string | null) {
  assertOfficeWriter(user);
  return sequelize.transaction(async (transaction) => {
    const customer = await Customer.findOne({ where: { id, companyId: user.companyId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!customer) throw notFound('Customer');
    const [sites, jobs] = await Promise.all([
      Site.count({ where: { customerId: id, companyId: user.companyId }, transaction }),
      Job.count({ where: { customerId: id, companyId: user.companyId }, transaction }),
    ]);
    if (sites + jobs === 0) {
      await customer.destroy({ transaction });
      await recordAudit(user, { action: 'delete', entityType: ENTITY, entityId: id, changes: { name: customer.name }, reason }, transaction);
      return { id, archived: false, deleted: true };
    }
    if (!customer.archivedAt) {
      await customer.update({ archivedAt: new Date() }, { transaction });
      await recordAudit(user, { action: 'archive', entityType: ENTITY, entityId: id, reason }, transaction);
    }
    return { id, archived: true, deleted: false };
  });
}
