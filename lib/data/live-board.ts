import 'server-only';
import { Op, type WhereOptions } from 'sequelize';
import { Crew, Install, InstallEvent, Job, Repair, Segment } from '@/models';
import { CLOCK_MATERIALS_INCLUDE, type ClockMaterials } from './install-materials';
import type { SessionUser } from '@/lib/auth/session';
import { isDeskRole } from '@/lib/auth/roles';
import { resinClockSpec } from '@/lib/cure';
import { dayInZone } from '@/lib/time/dates';
import type { Role } from '@/lib/domain/vocabulary';
import { forbidden } from '@/lib/server/errors';
import { installClock } from '@/lib/install/plan-and-flags';
import { deriveInstallState, type InstallStep } from '@/lib/install/state';
import { getCompany } from './company';

/** Who may open the live board: the office and admins (whole company), foremen (their crews). */
export const LIVE_BOARD_ROLES: readonly Role[] = ['admin', 'office', 'foreman'];

/** One install on the board: where it is and the two deadlines its clock runs to (ISO instants). */
export type LiveBoardInstall = {
  id: string;
  status: string;
  step: InstallStep;
  crew: { id: string; name: string } | null;
  job: { id: string; number: string; title: string | null };
  repair: { id: string; position: number; defectType: string; distanceMm: number; segmentLabel: string | null };
  mixedAt: string | null;
  inflatedAt: string | null;
  deflatedAt: string | null;
  inflateBy: string | null;
  deflateAfter: string | null;
  finishedAt: string | null;
  lastEventAt: string | null;
};

export type LiveBoard = {
  inProgress: LiveBoardInstall[];
  /** Installs signed off today (the company's day), newest first. */
  doneToday: LiveBoardInstall[];
  timeZone: string;
  unitSystem: 'imperial' | 'metric';
  serverTime: string;
};

export type LiveBoardResponse = LiveBoard;

/** At most this many rows per list: a board is for the day's work, not the archive. */
const BOARD_LIMIT = 200;

/**
 * Every install of the caller's company in progress, and those finished today; a foreman sees his crews' only.
 * The deadlines come from the event log and the resin clock (the same fold the tablet runs).
 */
export async function getLiveBoard(user: SessionUser, now = new Date()): Promise<LiveBoard> {
  if (!LIVE_BOARD_ROLES.includes(user.role)) throw forbidden('The live board is for the office and foremen.');
  const company = await getCompany(user);
  const today = dayInZone(now, company.timeZone);
  // A day is at most 26 hours long in any zone: fetch the last 26 h of finished installs and keep today's.
  const since = new Date(now.getTime() - 26 * 3600_000);
  const crewScope: WhereOptions = isDeskRole(user.role)
    ? {}
    : { [Op.or]: [{ crewId: { [Op.in]: user.crewIds } }, { '$job.crew_id$': { [Op.in]: user.crewIds } }] };
  if (!isDeskRole(user.role) && user.crewIds.length === 0) return emptyBoard(company, now);

  const rows = await Install.findAll({
    where: {
      companyId: user.companyId,
      ...crewScope,
      [Op.and]: [{ [Op.or]: [{ status: 'in_progress' }, { finishedAt: { [Op.gte]: since } }] }],
    },
    include: [
      {
        model: Job,
        as: 'job',
        attributes: ['id', 'number', 'title', 'crewId'],
        include: [{ model: Crew, as: 'crew', attributes: ['id', 'name'] }],
      },
      { model: Crew, as: 'crew', attributes: ['id', 'name'] },
      {
        model: Repair,
        as: 'repair',
        attributes: ['id', 'position', 'defectType', 'distanceMm'],
        include: [{ model: Segment, as: 'segment', attributes: ['label'] }],
      },
      { model: InstallEvent, as: 'events' },
      ...CLOCK_MATERIALS_INCLUDE,
    ],
    order: [['createdAt', 'ASC']],
  });

  const board = rows.map((row) => {
    const install = row.get({ plain: true }) as BoardRow;
    const state = deriveInstallState(install.events);
    const { plan } = installClock({
      state,
      resin: install.resinSystem ? resinClockSpec(install.resinSystem) : null,
      packer: install.packer,
      resinKitExpiresOn: install.resinKit?.expiresOn ?? null,
      safetyMargin: company.workingWindowSafetyMargin,
      holdReserve: company.holdReserve,
      unitSystem: company.unitSystem,
      now,
    });
    const crew = install.crew ?? install.job.crew ?? null;
    const lastEventAt = install.events.reduce<Date | null>(
      (max, e) => (max === null || e.receivedAt > max ? e.receivedAt : max),
      null,
    );
    const item: LiveBoardInstall = {
      id: install.id,
      status: install.status,
      step: state.step,
      crew: crew && { id: crew.id, name: crew.name },
      job: { id: install.job.id, number: install.job.number, title: install.job.title ?? null },
      repair: {
        id: install.repair.id,
        position: install.repair.position,
        defectType: install.repair.defectType,
        distanceMm: install.repair.distanceMm,
        segmentLabel: install.repair.segment?.label ?? null,
      },
      mixedAt: iso(state.mixedAt),
      inflatedAt: iso(state.inflatedAt),
      deflatedAt: iso(state.deflatedAt),
      // Only a real mix starts the clock: before it, the plan is a preview that moves with "now".
      inflateBy: state.mixedAt && plan ? iso(plan.inflateBy) : null,
      deflateAfter: state.inflatedAt && plan?.deflateAfter ? iso(plan.deflateAfter) : null,
      finishedAt: iso(install.finishedAt),
      lastEventAt: iso(lastEventAt),
    };
    return item;
  });

  const inProgress = board
    .filter((i) => i.status === 'in_progress')
    .sort((a, b) => (a.crew?.name ?? '').localeCompare(b.crew?.name ?? '') || a.job.number.localeCompare(b.job.number))
    .slice(0, BOARD_LIMIT);
  const doneToday = board
    .filter(
      (i) =>
        i.status !== 'in_progress' &&
        i.finishedAt !== null &&
        dayInZone(new Date(i.finishedAt), company.timeZone) === today,
    )
    .sort((a, b) => (b.finishedAt ?? '').localeCompare(a.finishedAt ?? ''))
    .slice(0, BOARD_LIMIT);
  return {
    inProgress,
    doneToday,
    timeZone: company.timeZone,
    unitSystem: company.unitSystem,
    serverTime: now.toISOString(),
  };
}

type BoardRow = Install & {
  job: Job & { crew: Crew | null };
  crew: Crew | null;
  repair: Repair & { segment: Segment | null };
  events: InstallEvent[];
} & ClockMaterials;

const iso = (date: Date | string | null | undefined) => (date ? new Date(date).toISOString() : null);

const emptyBoard = (company: { timeZone: string; unitSystem: 'imperial' | 'metric' }, now: Date): LiveBoard => ({
  inProgress: [],
  doneToday: [],
  timeZone: company.timeZone,
  unitSystem: company.unitSystem,
  serverTime: now.toISOString(),
});
