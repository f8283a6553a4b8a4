import 'server-only';
import { Op, type WhereOptions } from 'sequelize';
import { sequelize } from '@/lib/data/db';
import { isDeskRole } from '@/lib/auth/roles';
import { forbidden } from '@/lib/server/errors';
import type { SessionUser } from '@/lib/auth/session';

/** Office records (customers, sites, segments, jobs, repairs) are written by the office and admins only. */
export function assertOfficeWriter(user: SessionUser) {
  if (!isDeskRole(user.role)) throw forbidden('Only the office can change this record.');
}

/** Company settings (users, crews, materials, the company itself) are an admin's. */
export function assertAdmin(user: SessionUser) {
  if (user.role !== 'admin') throw forbidden('Only an admin can change company settings.');
}

/**
 * For field users, limits a query to rows their crews' jobs use: `column` must be IN the given column of
 * those jobs (e.g. `id` of customers IN jobs.customer_id). Desk users see the whole company; undefined then.
 */
export function crewJobsWhere(
  user: SessionUser,
  column: string,
  jobColumn: 'id' | 'customer_id' | 'site_id',
): WhereOptions | undefined {
  if (isDeskRole(user.role)) return undefined;
  if (user.crewIds.length === 0) return { id: null }; // no crew, nothing to read
  const crewList = user.crewIds.map((id) => sequelize.escape(id)).join(', ');
  const subquery = `(SELECT ${jobColumn} FROM jobs WHERE company_id = ${sequelize.escape(user.companyId)} AND crew_id IN (${crewList}))`;
  return { [column]: { [Op.in]: sequelize.literal(subquery) } };
}
