import 'server-only';
import { Op, type WhereOptions } from 'sequelize';
import type { ListQuery } from '@/lib/validation/list';

/** What every list answers: one page of rows and the count of all that match. */
export type Page<T> = { items: T[]; total: number; page: number; pageSize: number; pageCount: number };

export function pageOf<T>(items: T[], total: number, query: Pick<ListQuery, 'page' | 'pageSize'>): Page<T> {
  return {
    items,
    total,
    page: query.page,
    pageSize: query.pageSize,
    pageCount: Math.max(1, Math.ceil(total / query.pageSize)),
  };
}

/** limit/offset for Sequelize; an export asks for every matching row (capped, so one request cannot eat the server). */
export const EXPORT_LIMIT = 10_000;
export function windowOf(query: Pick<ListQuery, 'page' | 'pageSize'>, exportAll = false) {
  return exportAll
    ? { limit: EXPORT_LIMIT, offset: 0 }
    : { limit: query.pageSize, offset: (query.page - 1) * query.pageSize };
}

/** An ILIKE pattern that matches the text literally (%, _ and \ escaped). */
export const likePattern = (q: string) => `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

/** Search `q` over several columns (use '$alias.column$' for joined ones). */
export function searchWhere(q: string | undefined, columns: string[]): WhereOptions | undefined {
  if (!q) return undefined;
  const like = likePattern(q);
  return { [Op.or]: columns.map((column) => ({ [column]: { [Op.iLike]: like } })) };
}

/** Archived rows are hidden unless the list asks for them. */
export function archivedWhere(archived: ListQuery['archived']): WhereOptions {
  if (archived === 'true') return {};
  return { archivedAt: archived === 'only' ? { [Op.ne]: null } : null };
}

/** Joins the parts of a where clause that are present. */
export function allOf(...parts: (WhereOptions | undefined)[]): WhereOptions {
  const present = parts.filter(
    (part): part is WhereOptions =>
      part !== undefined && Object.keys(part).length + Object.getOwnPropertySymbols(part).length > 0,
  );
  return present.length === 1 ? present[0] : { [Op.and]: present };
}
