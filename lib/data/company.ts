import 'server-only';
import { ChecklistTemplate, Company, Crew, Packer, ResinKit, ResinSystem, User } from '@/models';
import { sequelize } from '@/lib/data/db';
import { changedFields, recordAudit } from '@/lib/data/audit';
import type { SessionUser } from '@/lib/auth/session';
import { notFound } from '@/lib/server/errors';
import type { CompanyPatch } from '@/lib/validation/company';
import { CLOCK_SETTINGS, markDerivedStale } from './install-derive';
import { assertAdmin } from './scope';

const ENTITY = 'company';

export type CompanyResponse = Awaited<ReturnType<typeof getCompany>>;

/** The caller's company settings (time zone, units, planning margins). */
export async function getCompany(user: SessionUser) {
  const company = await Company.findByPk(user.companyId);
  if (!company) throw notFound('Company');
  return company.get({ plain: true });
}

/** Changes the caller's company settings (admin only), audited with each field's before and after. */
export async function updateCompany(user: SessionUser, patch: CompanyPatch) {
  assertAdmin(user);
  return sequelize.transaction(async (transaction) => {
    const company = await Company.findByPk(user.companyId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!company) throw notFound('Company');
    const changes = changedFields(company.get({ plain: true }), patch);
    if (Object.keys(changes).length) {
      await company.update(patch, { transaction });
      await recordAudit(user, { action: 'update', entityType: ENTITY, entityId: company.id, changes }, transaction);
      if (CLOCK_SETTINGS.some((key) => key in changes))
        await markDerivedStale(user.companyId, 'companySettings', transaction);
    }
    return company.get({ plain: true });
  });
}

/** How many of each thing the admin manages, for the settings index. */
export async function getSettingsCounts(user: SessionUser) {
  const where = { companyId: user.companyId };
  const [users, activeUsers, crews, resinSystems, resinKits, packers, checklists] = await Promise.all([
    User.count({ where }),
    User.count({ where: { ...where, active: true } }),
    Crew.count({ where: { ...where, archivedAt: null } }),
    ResinSystem.count({ where }),
    ResinKit.count({ where }),
    Packer.count({ where }),
    ChecklistTemplate.count({ where }),
  ]);
  return { users, activeUsers, crews, resinSystems, resinKits, packers, checklists };
}
