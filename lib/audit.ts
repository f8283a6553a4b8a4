import 'server-only';
import type { Transaction } from 'sequelize';
import { AuditEntry } from '@/models';
import type { SessionUser } from '@/lib/auth/session';

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
    { companyId: user.companyId, userId: user.id, action: entry.action, entityType: entry.entityType, entityId: entry.entityId, changes: entry.changes ?? {}, reason: entry.reason ?? null },
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
