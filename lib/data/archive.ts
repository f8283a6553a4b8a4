import 'server-only';
import type { Model, Transaction } from 'sequelize';
import { recordAudit } from '@/lib/audit';
import type { SessionUser } from '@/lib/auth/session';

type Archivable = Model & { id: string; archivedAt: Date | null };

/**
 * The DELETE of an office record: archived (kept, hidden from lists) when `dependents` > 0 so the
 * history that uses it stays readable, deleted otherwise. Audited either way, in the caller's transaction.
 */
export async function archiveOrDelete(
  user: SessionUser,
  row: Archivable,
  audit: { entityType: string; summary: Record<string, unknown>; reason?: string | null },
  dependents: number,
  transaction: Transaction,
) {
  const { entityType, summary, reason } = audit;
  if (dependents === 0) {
    await row.destroy({ transaction });
    await recordAudit(user, { action: 'delete', entityType, entityId: row.id, changes: summary, reason }, transaction);
    return { id: row.id, archived: false, deleted: true };
  }
  if (!row.archivedAt) {
    await row.update({ archivedAt: new Date() }, { transaction });
    await recordAudit(user, { action: 'archive', entityType, entityId: row.id, reason }, transaction);
  }
  return { id: row.id, archived: true, deleted: false };
}
