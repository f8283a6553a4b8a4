import 'server-only';
import type { Model, ModelStatic, Transaction, WhereOptions } from 'sequelize';
import { sequelize } from '@/lib/data/db';
import { changedFields, recordAudit } from '@/lib/data/audit';
import { notFound } from '@/lib/server/errors';
import type { SessionUser } from '@/lib/auth/session';

// The shared steps of writing a company's record: lock it, change it, archive or delete it — each audited.

type Row = Model & { id: string; get(options: { plain: true }): Record<string, unknown>; get(key: string): unknown };

/** One of the company's rows, locked for a change in this transaction; 404 when missing or another company's. */
export async function lockOwnRow<M extends Row>(
  model: ModelStatic<M>,
  user: SessionUser,
  id: string,
  what: string,
  transaction: Transaction,
): Promise<M> {
  const row = await model.findOne({
    where: { id, companyId: user.companyId } as WhereOptions,
    transaction,
    lock: transaction.LOCK.UPDATE,
  });
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
  if (!inUse) {
    await row.destroy({ transaction });
    await recordAudit(user, { action: 'delete', entityType, entityId: row.id, changes: summary, reason }, transaction);
    return { id: row.id, archived: false, deleted: true };
  }
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
