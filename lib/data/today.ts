import 'server-only';
import { Op } from 'sequelize';
import { AccessPoint, Customer, Install, Job, Repair, Segment, Site } from '@/models';
import type { SessionUser } from '@/lib/auth/session';
import type { InstallStep } from '@/lib/install/state';
import { dayInZone } from '@/lib/time/dates';
import { getCompany } from './company';
import { ensureDerived, settingsOf, type CompanySettings } from './install-derive';
import type { JobDetail } from './jobs';

/** What the list shows of a repair's latest install: where it stands and the clock that runs now. */
export type InstallSummary = {
  id: string;
  status: string;
  step: InstallStep;
  deadline: { label: string; start: string; at: string } | null;
};

export type TodayJob = Omit<JobDetail, 'crew' | 'repairs'> & {
  repairs: (JobDetail['repairs'][number] & { install: InstallSummary | null })[];
};

/** Jobs of the caller's crews scheduled for today and tomorrow in the company's time zone (and any sent back), with any running install. */
export async function listTodayJobs(user: SessionUser, now = new Date()) {
  const company = await getCompany(user);
  const today = dayInZone(now, company.timeZone);
  const tomorrow = dayInZone(now, company.timeZone, 1);
  if (user.crewIds.length === 0) return { today, tomorrow, jobs: [] as TodayJob[] };
  const jobs = await Job.findAll({
    where: {
      companyId: user.companyId,
      crewId: { [Op.in]: user.crewIds },
      status: { [Op.notIn]: ['cancelled', 'draft'] },
      // A job the office sent back stays on the list, whatever its day, until the crew has dealt with it.
      [Op.or]: [{ scheduledDate: { [Op.in]: [today, tomorrow] } }, { status: 'sent_back' }],
      archivedAt: null,
    },
    include: [
      { model: Customer, as: 'customer', attributes: ['id', 'name', 'phone'] },
      { model: Site, as: 'site', include: [{ model: AccessPoint, as: 'accessPoints' }] },
      { model: Repair, as: 'repairs', include: [{ model: Segment, as: 'segment' }] },
    ],
    order: [
      ['scheduledDate', 'ASC'],
      ['number', 'ASC'],
      [{ model: Repair, as: 'repairs' }, 'position', 'ASC'],
    ],
  });
  const repairIds = jobs.flatMap((job) => (job.get('repairs') as Repair[]).map((r) => r.id));
  const installs = await latestInstalls(user, repairIds, company);
  return {
    today,
    tomorrow,
    jobs: jobs.map((job) => {
      const plain = job.get({ plain: true }) as Omit<JobDetail, 'crew'>;
      return {
        ...plain,
        repairs: plain.repairs.map((repair) => ({ ...repair, install: installs.get(repair.id) ?? null })),
      };
    }),
  };
}

/** The latest install of each repair, from the state kept on its row (no log is read). */
async function latestInstalls(user: SessionUser, repairIds: string[], company: CompanySettings) {
  if (repairIds.length) await ensureDerived(user, settingsOf(company));
  const rows = repairIds.length
    ? await Install.findAll({
        where: { companyId: user.companyId, repairId: { [Op.in]: repairIds }, status: { [Op.ne]: 'abandoned' } },
        attributes: [
          'id',
          'repairId',
          'status',
          'step',
          'mixedAt',
          'inflatedAt',
          'deflatedAt',
          'inflateBy',
          'deflateAfter',
        ],
        order: [['createdAt', 'ASC']],
      })
    : [];
  const byRepair = new Map<string, InstallSummary>();
  for (const install of rows) {
    let deadline: InstallSummary['deadline'] = null;
    if (install.mixedAt && !install.inflatedAt && install.inflateBy) {
      deadline = { label: 'Inflate by', start: install.mixedAt.toISOString(), at: install.inflateBy.toISOString() };
    } else if (install.deflateAfter && install.inflatedAt && !install.deflatedAt) {
      deadline = {
        label: 'Deflate after',
        start: install.inflatedAt.toISOString(),
        at: install.deflateAfter.toISOString(),
      };
    }
    byRepair.set(install.repairId, {
      id: install.id,
      status: install.status,
      step: install.step as InstallStep,
      deadline,
    });
  }
  return byRepair;
}
