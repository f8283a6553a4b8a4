import 'server-only';
import type { InferAttributes } from 'sequelize';
import { Customer, Job, Site } from '@/models';
import { sequelize } from '@/lib/data/db';
import { notFound } from '@/lib/server/errors';
import type { SessionUser } from '@/lib/auth/session';
import type { CustomerListQuery, customerInputSchema, customerPatchSchema } from '@/lib/validation/customers';
import type { z } from 'zod';
import { allOf, archivedWhere, searchWhere } from './list';
import { assertOfficeWriter, crewJobsWhere } from './scope';
import { archiveOrDelete, createAudited, lockOwnRow, plainPage, updateAudited } from './records';

const ENTITY = 'customer';

export type CustomerListResponse = Awaited<ReturnType<typeof listCustomers>>;

/** A page of the caller's customers (field users: only those of their crews' jobs). */
export async function listCustomers(user: SessionUser, query: CustomerListQuery, exportAll = false) {
  const where = allOf(
    { companyId: user.companyId },
    archivedWhere(query.archived),
    query.kind ? { kind: query.kind } : undefined,
    searchWhere(query.q, ['name', 'contactName', 'email', 'phone']),
    crewJobsWhere(user, 'id', 'customer_id'),
  );
  return plainPage<Customer>(Customer, where, query, exportAll);
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
  return createAudited(user, Customer, ENTITY, input);
}

export async function updateCustomer(user: SessionUser, id: string, patch: z.output<typeof customerPatchSchema>) {
  assertOfficeWriter(user);
  return sequelize.transaction(async (transaction) =>
    updateAudited(user, await lockOwnRow(Customer, user, id, 'Customer', transaction), ENTITY, patch, transaction),
  ) as Promise<InferAttributes<Customer>>;
}

/**
 * Archives a customer that has sites or jobs (history must stay readable) and deletes one that has none.
 */
export async function archiveCustomer(user: SessionUser, id: string, reason?: string | null) {
  assertOfficeWriter(user);
  return sequelize.transaction(async (transaction) => {
    const customer = await lockOwnRow(Customer, user, id, 'Customer', transaction);
    const [sites, jobs] = await Promise.all([
      Site.count({ where: { customerId: id, companyId: user.companyId }, transaction }),
      Job.count({ where: { customerId: id, companyId: user.companyId }, transaction }),
    ]);
    return archiveOrDelete(
      user,
      customer,
      { entityType: ENTITY, inUse: sites + jobs > 0, summary: { name: customer.name }, reason },
      transaction,
    );
  });
}
