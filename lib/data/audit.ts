import 'server-only';
import type { InferAttributes } from 'sequelize';
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
  return rows.map((row) => row.get({ plain: true }) as InferAttributes<AuditEntry> & { user: { id: string; name: string } | null });
}
