import 'server-only';
import type { Attributes, Model, ModelStatic, Transaction, WhereOptions } from 'sequelize';
import { sequelize } from '@/lib/data/db';
import { changedFields, recordAudit } from '@/lib/data/audit';
import { notFound } from '@/lib/server/errors';
import type { SessionUser } from '@/lib/auth/session';
import type { ListQuery } from '@/lib/validation/list';
import { pageOf, windowOf } from './list';
import { assertAdmin } from './scope';

// The shared steps of writing a company's record: lock it, change it, archive or delete it — each audited.

type Row = Model & { id: string; get(options: { plain: true }): Record<string, unknown>; get(key: string): unknown };

/** One of the company's rows, locked for a change in this transaction; null when missing or another company's. */
export async function findOwnRowLocked<M extends Row>(
  model: ModelStatic<M>,
  user: SessionUser,
  id: string,
  transaction: Transaction,
): Promise<M | null> {
  return model.findOne({
    where: { id, companyId: user.companyId } as WhereOptions,
    transaction,
    lock: transaction.LOCK.UPDATE,
  });
}

/** As findOwnRowLocked, with a 404 (named `what`) for a missing row or another company's. */
export async function lockOwnRow<M extends Row>(
  model: ModelStatic<M>,
  user: SessionUser,
  id: string,
  what: string,
  transaction: Transaction,
): Promise<M> {
  const row = await findOwnRowLocked(model, user, id, transaction);
  if (!row) throw notFound(what);
  return row;
}

/** Writes the fields a PATCH really changes and audits them as { field: { from, to } }. */
export async function updateAudited(
  user: SessionUser,
  row: Row,
  entityType: string,
  patch: Record<string, unknown>,
  transaction: Transaction,
) {
  const changes = changedFields(row.get({ plain: true }), patch);
  if (Object.keys(changes).length) {
    await row.update(patch, { transaction });
    await recordAudit(user, { action: 'update', entityType, entityId: row.id, changes }, transaction);
  }
  return row.get({ plain: true });
}

/** Creates one of the company's records and audits it, in one transaction. */
export async function createAudited<M extends Row>(
  user: SessionUser,
  model: ModelStatic<M>,
  entityType: string,
  values: Record<string, unknown>,
) {
  return sequelize.transaction(async (transaction) => {
    const row = await model.create({ ...values, companyId: user.companyId } as never, { transaction });
    await recordAudit(user, { action: 'create', entityType, entityId: row.id, changes: values }, transaction);
    return row.get({ plain: true });
  });
}

/** Deletes the row and audits it, `summary` saying what it was, in the caller's transaction. */
export async function deleteAudited(
  user: SessionUser,
  row: Row,
  { entityType, summary, reason }: { entityType: string; summary: Record<string, unknown>; reason?: string | null },
  transaction: Transaction,
) {
  await row.destroy({ transaction });
  await recordAudit(user, { action: 'delete', entityType, entityId: row.id, changes: summary, reason }, transaction);
  return { id: row.id, archived: false, deleted: true };
}

/**
 * The DELETE of any record: archived (kept, hidden from lists) when something uses it, so the history that
 * names it stays readable; deleted otherwise. Audited either way, in the caller's transaction.
 * Most tables mark archiving with `archived_at`; `archive` names other columns (a check-list's `active`).
 */
export async function archiveOrDelete(
  user: SessionUser,
  row: Row,
  {
    entityType,
    inUse,
    summary,
    reason,
    archive,
  }: {
    entityType: string;
    inUse: boolean;
    summary: Record<string, unknown>;
    reason?: string | null;
    archive?: { values: Record<string, unknown>; isArchived: boolean };
  },
  transaction: Transaction,
) {
  if (!inUse) return deleteAudited(user, row, { entityType, summary, reason }, transaction);
  const { values, isArchived } = archive ?? {
    values: { archivedAt: new Date() },
    isArchived: row.get('archivedAt') != null,
  };
  if (!isArchived) {
    await row.update(values, { transaction });
    await recordAudit(user, { action: 'archive', entityType, entityId: row.id, reason }, transaction);
  }
  return { id: row.id, archived: true, deleted: false };
}

/** One page of a company list as plain rows: the query's sort then id (a stable order), and its window. */
export async function plainPage<M extends Row>(
  model: ModelStatic<M>,
  where: WhereOptions,
  query: ListQuery,
  exportAll: boolean,
) {
  const { rows, count } = await model.findAndCountAll({
    where,
    order: [
      [query.sort, query.dir.toUpperCase()],
      ['id', 'ASC'],
    ],
    ...windowOf(query, exportAll),
  });
  return pageOf(
    rows.map((row) => row.get({ plain: true }) as Attributes<M>),
    count,
    query,
  );
}

/**
 * The reads and writes of a company settings record (packers, resin systems, check-list templates), each with
 * the same checks: writes are an admin's (`assertAdmin`), rows are the company's (another company's is a 404 named
 * `what`), and every change is audited as `entity` in its own transaction.
 */
export function settingsRecord<M extends Row & { name: string }>(model: ModelStatic<M>, entity: string, what: string) {
  return {
    /** The company's row, or 404. */
    async find(user: SessionUser, id: string) {
      const row = await model.findOne({ where: { id, companyId: user.companyId } as WhereOptions });
      if (!row) throw notFound(what);
      return row.get({ plain: true }) as Attributes<M>;
    },
    async create(user: SessionUser, values: Record<string, unknown>) {
      assertAdmin(user);
      return createAudited(user, model, entity, values) as Promise<Attributes<M>>;
    },
    /**
     * `change` turns the locked row into what is written (it may throw to refuse the edit); `afterChange` runs in the
     * same transaction (what else the edit makes stale).
     */
    async update(
      user: SessionUser,
      id: string,
      change: (row: M) => Record<string, unknown>,
      afterChange?: (transaction: Transaction) => Promise<unknown>,
    ) {
      assertAdmin(user);
      return sequelize.transaction(async (transaction) => {
        const row = await lockOwnRow(model, user, id, what, transaction);
        const updated = (await updateAudited(user, row, entity, change(row), transaction)) as Attributes<M>;
        await afterChange?.(transaction);
        return updated;
      });
    },
    /** Archives the row when `uses` counts anything that names it, deletes it otherwise (see archiveOrDelete). */
    async archive(
      user: SessionUser,
      id: string,
      uses: (transaction: Transaction) => Promise<number>,
      archiveAs?: (row: M) => { values: Record<string, unknown>; isArchived: boolean },
    ) {
      assertAdmin(user);
      return sequelize.transaction(async (transaction) => {
        const row = await lockOwnRow(model, user, id, what, transaction);
        const inUse = (await uses(transaction)) > 0;
        const archive = archiveAs?.(row);
        return archiveOrDelete(
          user,
          row,
          { entityType: entity, inUse, summary: { name: row.name }, archive },
          transaction,
        );
      });
    },
  };
}
