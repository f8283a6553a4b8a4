import 'server-only';
import { Op } from 'sequelize';
import { AccessPoint, Customer, Job, Repair, Segment, Site } from '@/models';
import type { SessionUser } from '@/lib/auth/session';
import type { JobDetail } from './jobs';
import { getCompany } from './company';

/** A calendar day (YYYY-MM-DD) in a time zone, `offsetDays` from the given instant. */
export function dayInZone(instant: Date, timeZone: string, offsetDays = 0): string {
  const shifted = new Date(instant.getTime() + offsetDays * 86_400_000);
  // en-CA formats as YYYY-MM-DD.
  return new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(shifted);
}

/** Jobs of the caller's crews scheduled for today and tomorrow in the company's time zone. */
export async function listTodayJobs(user: SessionUser, now = new Date()) {
  const company = await getCompany(user);
  const today = dayInZone(now, company.timeZone);
  const tomorrow = dayInZone(now, company.timeZone, 1);
  if (user.crewIds.length === 0) return { today, tomorrow, jobs: [] as Omit<JobDetail, 'crew'>[] };
  const jobs = await Job.findAll({
    where: {
      companyId: user.companyId,
      crewId: { [Op.in]: user.crewIds },
      scheduledDate: { [Op.in]: [today, tomorrow] },
      status: { [Op.notIn]: ['cancelled', 'draft'] },
      archivedAt: null,
    },
    include: [
      { model: Customer, as: 'customer', attributes: ['id', 'name', 'phone'] },
      { model: Site, as: 'site', include: [{ model: AccessPoint, as: 'accessPoints' }] },
      { model: Repair, as: 'repairs', include: [{ model: Segment, as: 'segment' }] },
    ],
    order: [['scheduledDate', 'ASC'], ['number', 'ASC'], [{ model: Repair, as: 'repairs' }, 'position', 'ASC']],
  });
  return { today, tomorrow, jobs: jobs.map((job) => job.get({ plain: true }) as Omit<JobDetail, 'crew'>) };
}
