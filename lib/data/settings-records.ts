import 'server-only';
import type { Model, ModelStatic, Transaction, WhereOptions } from 'sequelize';
import { sequelize } from '@/lib/db';
import { changedFields, recordAudit } from '@/lib/audit';
import { notFound } from '@/lib/errors';
import type { SessionUser } from '@/lib/auth/session';

// The shared steps of the company's settings records (resin systems and kits, packers, check-lists).

type Row = Model & { id: string; get(options: { plain: true }): Record<string, unknown> };

/** One of the company's rows, locked for a change in this transaction; 404 when missing or another company's. */
export async function lockOwnRow<M extends Row>(model: ModelStatic<M>, user: SessionUser, id: string, what: string, transaction: Transaction): Promise<M> {
  const row = await model.findOne({ where: { id, companyId: user.companyId } as WhereOptions, transaction, lock: transaction.LOCK.UPDATE });
  if (!row) throw notFound(what);
  return row;
}

/** Writes the fields a PATCH really changes and audits them as { field: { from, to } }. */
export async function updateAudited(user: SessionUser, row: Row, entityType: string, patch: Record<string, unknown>, transaction: Transaction) {
  const changes = changedFields(row.get({ plain: true }), patch);
  if (Object.keys(changes).length) {
    await row.update(patch, { transaction });
    await recordAudit(user, { action: 'update', entityType, entityId: row.id, changes }, transaction);
  }
  return row.get({ plain: true });
}

/**
 * DELETE of a settings record: archived (kept for the installs that name it) when in use, deleted otherwise.
 * `archive` holds the columns that mark it archived.
 */
export async function archiveOrDelete(
  user: SessionUser,
  row: Row,
  { entityType, inUse, archive, isArchived, name }: { entityType: string; inUse: boolean; archive: Record<string, unknown>; isArchived: boolean; name: string },
  transaction: Transaction,
) {
  if (!inUse) {
    await row.destroy({ transaction });
    await recordAudit(user, { action: 'delete', entityType, entityId: row.id, changes: { name } }, transaction);
    return { id: row.id, archived: false, deleted: true };
  }
  if (!isArchived) {
    await row.update(archive, { transaction });
    await recordAudit(user, { action: 'archive', entityType, entityId: row.id }, transaction);
  }
  return { id: row.id, archived: true, deleted: false };
}

/** Creates one of the company's settings records and audits it, in one transaction. */
export async function createAudited<M extends Row>(user: SessionUser, model: ModelStatic<M>, entityType: string, values: Record<string, unknown>) {
  return sequelize.transaction(async (transaction) => {
    const row = await model.create({ ...values, companyId: user.companyId } as never, { transaction });
    await recordAudit(user, { action: 'create', entityType, entityId: row.id, changes: values }, transaction);
    return row.get({ plain: true });
  });
}
