import 'server-only';
import type { InferAttributes, Transaction } from 'sequelize';
import { AuditEntry, User } from '@/models';
import type { SessionUser } from '@/lib/auth/session';

/** The audit trail of one record, newest first, with who made each change. */
export async function listAudit(user: SessionUser, entityType: string, entityId: string, limit = 50) {
  const rows = await AuditEntry.findAll({
    where: { companyId: user.companyId, entityType, entityId },
    include: [{ model: User, as: 'user', attributes: ['id', 'name'] }],
    order: [['createdAt', 'DESC']],
    limit,
  });
  return rows.map(
    (row) => row.get({ plain: true }) as InferAttributes<AuditEntry> & { user: { id: string; name: string } | null },
  );
}

type Audit = {
  action: 'create' | 'update' | 'archive' | 'restore' | 'delete' | (string & {});
  entityType: string;
  entityId: string;
  changes?: Record<string, unknown>;
  reason?: string | null;
};

/** One line of the audit trail: who, when (created_at), what and why. Written in the caller's transaction. */
export async function recordAudit(user: SessionUser, entry: Audit, transaction?: Transaction) {
  await AuditEntry.create(
    {
      companyId: user.companyId,
      userId: user.id,
      action: entry.action,
      entityType: entry.entityType,
      entityId: entry.entityId,
      changes: entry.changes ?? {},
      reason: entry.reason ?? null,
    },
    { transaction },
  );
}

/** The fields an update really changed, as { field: { from, to } }; dates and numbers compared by value. */
export function changedFields(before: Record<string, unknown>, patch: Record<string, unknown>) {
  const changes: Record<string, { from: unknown; to: unknown }> = {};
  for (const [field, to] of Object.entries(patch)) {
    if (to === undefined) continue;
    const from = before[field] ?? null;
    if (normalise(from) !== normalise(to)) changes[field] = { from, to };
  }
  return changes;
}

const normalise = (value: unknown) => (value instanceof Date ? value.toISOString() : JSON.stringify(value ?? null));
