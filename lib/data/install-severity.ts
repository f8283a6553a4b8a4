import 'server-only';
// The review list's order by severity (GET /api/installs?sort=severity): the page's ids and the count of all that
// match, in SQL over the installs' own columns, joining jobs and customers only when a filter reads them.
import { QueryTypes } from 'sequelize';
import { sequelize } from '@/models';
import type { SessionUser } from '@/lib/auth/session';
import { isDeskRole } from '@/lib/auth/roles';
import type { InstallListQuery } from '@/lib/validation/reviews';
import { severityRankSql } from './install-derive';
import { likePattern, windowOf } from './list';

/** Mixed and inflated: time passing can no longer raise the rank, so the stored `severity_rank` is the rank now. */
const SETTLED = 'i.mixed_at IS NOT NULL AND i.inflated_at IS NOT NULL';
const PENDING = '(i.mixed_at IS NULL OR i.inflated_at IS NULL)';

/**
 * The ids of one page by severity (ascending, the default, puts the worst first; ties oldest-finished first, then
 * by id) and the count. Settled rows come in order from their index, the pending few are ranked against now();
 * each side gives at most the rows up to the page's end and the two are merged.
 */
export async function severityPage(user: SessionUser, query: InstallListQuery, exportAll = false) {
  const { limit, offset } = windowOf(query, exportAll);
  const { joins, where, replacements } = filtersOf(user, query);
  const dir = query.dir === 'asc' ? 'DESC' : 'ASC';
  const order = (rank: string, i = 'i.') => `${rank} ${dir}, ${i}finished_at ASC NULLS LAST, ${i}id ASC`;
  const side = (rank: string, extraJoin: string, part: string) =>
    `(SELECT i.id, ${rank} AS rank, i.finished_at FROM installs i ${extraJoin} ${joins}
      WHERE ${where} AND ${part} ORDER BY ${order(rank)} LIMIT :end)`;
  const idsSql =
    `SELECT id FROM (${side('i.severity_rank', '', SETTLED)} UNION ALL ` +
    `${side(severityRankSql('i', 'k'), 'LEFT JOIN resin_kits k ON k.id = i.resin_kit_id', PENDING)}) page ` +
    `ORDER BY ${order('rank', '')} LIMIT :limit OFFSET :offset`;
  const all = { ...replacements, limit, offset, end: offset + limit };
  const [page, [{ count }]] = await Promise.all([
    sequelize.query<{ id: string }>(idsSql, { replacements: all, type: QueryTypes.SELECT }),
    sequelize.query<{ count: number }>(`SELECT count(*)::int AS count FROM installs i ${joins} WHERE ${where}`, {
      replacements,
      type: QueryTypes.SELECT,
    }),
  ]);
  return { ids: page.map((row) => row.id), count };
}

/** The list's filters as SQL over `installs i`: the company, the status, the search and a field user's crews. */
function filtersOf(user: SessionUser, query: InstallListQuery) {
  const where = ['i.company_id = :companyId'];
  const replacements: Record<string, unknown> = { companyId: user.companyId };
  let joins = '';
  if (query.status) {
    where.push('i.status = :status');
    replacements.status = query.status;
  }
  if (query.q) {
    joins = 'JOIN jobs j ON j.id = i.job_id LEFT JOIN customers c ON c.id = j.customer_id';
    where.push('(j.number ILIKE :like OR c.name ILIKE :like)');
    replacements.like = likePattern(query.q);
  }
  if (!isDeskRole(user.role)) {
    if (!joins) joins = 'JOIN jobs j ON j.id = i.job_id';
    // Field users see the installs of their crews (by the install's crew or its job's).
    where.push(user.crewIds.length ? '(i.crew_id IN (:crewIds) OR j.crew_id IN (:crewIds))' : 'false');
    replacements.crewIds = user.crewIds;
  }
  return { joins, where: where.join(' AND '), replacements };
}
