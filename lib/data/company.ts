import 'server-only';
import { ChecklistTemplate, Company, Crew, Packer, ResinKit, ResinSystem, User } from '@/models';
import type { SessionUser } from '@/lib/auth/session';
import { notFound } from '@/lib/errors';

/** The caller's company settings (time zone, units, planning margins). */
export async function getCompany(user: SessionUser) {
  const company = await Company.findByPk(user.companyId);
  if (!company) throw notFound('Company');
  return company.get({ plain: true });
}

/** What the admin manages: users, crews, resin systems and kits, packers, check-list templates. */
export async function getCompanyOverview(user: SessionUser) {
  const where = { companyId: user.companyId };
  const [company, users, crews, resinSystems, resinKits, packers, checklists] = await Promise.all([
    getCompany(user),
    User.findAll({ where, order: [['name', 'ASC']] }),
    Crew.findAll({ where, include: [{ model: User, as: 'members', attributes: ['id', 'name', 'role'] }], order: [['name', 'ASC']] }),
    ResinSystem.findAll({ where, order: [['name', 'ASC']] }),
    ResinKit.findAll({ where, order: [['expiresOn', 'ASC']] }),
    Packer.findAll({ where, order: [['minDiameterMm', 'ASC']] }),
    ChecklistTemplate.findAll({ where, order: [['name', 'ASC']] }),
  ]);
  return {
    company,
    users: users.map((row) => row.get({ plain: true })),
    crews: crews.map((row) => row.get({ plain: true }) as Crew & { members: Pick<User, 'id' | 'name' | 'role'>[] }),
    resinSystems: resinSystems.map((row) => row.get({ plain: true })),
    resinKits: resinKits.map((row) => row.get({ plain: true })),
    packers: packers.map((row) => row.get({ plain: true })),
    checklists: checklists.map((row) => row.get({ plain: true })),
  };
}
