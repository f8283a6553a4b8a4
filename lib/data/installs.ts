import 'server-only';
import { UniqueConstraintError, type InferAttributes, type Model } from 'sequelize';
import {
  AccessPoint,
  ChecklistTemplate,
  Install,
  InstallEvent,
  Job,
  Packer,
  Repair,
  ResinKit,
  ResinSystem,
  Segment,
  Site,
  User,
} from '@/models';
import type { SessionUser } from '@/lib/auth/session';
import { resinClockSpec } from '@/lib/cure';
import { AppError, forbidden, notFound } from '@/lib/server/errors';
import { installClock } from '@/lib/install/plan-and-flags';
import { mayWorkOn } from '@/lib/install/access';
import { deriveInstallState } from '@/lib/install/state';
import { SizingInputError, fittingPackers, patchLength } from '@/lib/sizing';
import type { UnitSystem } from '@/lib/units';
import type { CreateInstallInput } from '@/lib/validation/install-events';
import { getCompany } from './company';
import { emptyDerived, settingsOf } from './install-derive';
import { redoChainOf } from './redo';
import { packerSizesOf } from './packers';
import { dayInZone } from '@/lib/time/dates';

type Plain<M extends Model> = InferAttributes<M>;

export type InstallRow = Plain<Install>;
export type InstallEventRow = Plain<InstallEvent>;

/**
 * Starts an install of a repair. The id is made on the device, so a create that is retried after
 * a lost answer finds the first one (`created: false`) instead of making a second.
 */
export async function createInstall(
  user: SessionUser,
  input: CreateInstallInput,
): Promise<{ install: InstallRow; created: boolean }> {
  const repair = await Repair.findOne({
    where: { id: input.repairId, companyId: user.companyId },
    include: [{ model: Job, as: 'job' }],
  });
  const job = (repair as (Repair & { job?: Job }) | null)?.job;
  if (!repair || !job) throw notFound('Repair');
  if (!mayWorkOn(user, [job.crewId])) throw forbidden('Only the crew assigned to this job can start an install on it.');

  const existing = await findExisting(user, input);
  if (existing) return { install: existing, created: false };
  if (repair.status === 'cancelled' || job.status === 'cancelled')
    throw new AppError(422, 'This repair was cancelled: there is nothing to install.');

  const checklist = await ChecklistTemplate.findOne({
    where: { companyId: user.companyId, active: true },
    order: [['updatedAt', 'DESC']],
  });
  try {
    const install = await Install.create({
      id: input.id,
      companyId: user.companyId,
      repairId: repair.id,
      jobId: job.id,
      crewId: job.crewId ?? null,
      checklistTemplateId: checklist?.id ?? null,
      // Derived from its (empty) log at once, so no reader has to derive it later.
      ...emptyDerived(settingsOf(await getCompany(user))),
    });
    return { install: install.get({ plain: true }), created: true };
  } catch (error) {
    // Two taps raced with the same id: the loser answers with the winner's row.
    if (!(error instanceof UniqueConstraintError)) throw error;
    const raced = await findExisting(user, input);
    if (!raced) throw error;
    return { install: raced, created: false };
  }
}

export type InstallViewResponse = Awaited<ReturnType<typeof getInstallView>>;

/** Everything the install screen needs in one read; never throws on a half-recorded install. */
export async function getInstallView(user: SessionUser, id: string, now = new Date()) {
  const install = await findInstallFor(user, id);
  const [company, row, events, kits, packers] = await Promise.all([
    getCompany(user),
    Install.findOne({
      where: { id: install.id, companyId: user.companyId },
      include: [
        {
          model: Repair,
          as: 'repair',
          include: [
            { model: Segment, as: 'segment', include: [{ model: AccessPoint, as: 'fromAccessPoint' }] },
            { model: AccessPoint, as: 'fromAccessPoint' },
          ],
        },
        { model: Job, as: 'job', include: [{ model: Site, as: 'site', attributes: ['addressLine', 'city'] }] },
        { model: ResinSystem, as: 'resinSystem' },
        { model: ResinKit, as: 'resinKit' },
        { model: Packer, as: 'packer' },
        { model: ChecklistTemplate, as: 'checklistTemplate' },
      ],
    }),
    InstallEvent.findAll({
      where: { installId: install.id, companyId: user.companyId },
      include: [{ model: User, as: 'user', attributes: ['name'] }],
      order: [
        ['deviceTime', 'ASC'],
        ['receivedAt', 'ASC'],
      ],
    }),
    ResinKit.findAll({
      where: { companyId: user.companyId, archivedAt: null },
      include: [{ model: ResinSystem, as: 'resinSystem', where: { archivedAt: null } }],
      order: [
        ['expiresOn', 'ASC'],
        ['lot', 'ASC'],
      ],
    }),
    Packer.findAll({
      where: { companyId: user.companyId, archivedAt: null },
      order: [
        ['minDiameterMm', 'ASC'],
        ['name', 'ASC'],
      ],
    }),
  ]);
  if (!row) throw notFound('Install');
  const full = row.get({ plain: true }) as InstallDetail;
  const { repair, job, resinSystem, resinKit, packer, checklistTemplate, ...installColumns } = full;
  const { fromAccessPoint, ...repairColumns } = repair;
  const { fromAccessPoint: segmentStart, ...segment } = repair.segment;

  const eventRows = events.map((event) => {
    const { user: author, ...columns } = event.get({ plain: true }) as InstallEventRow & {
      user?: { name: string } | null;
    };
    return { ...columns, userName: author?.name ?? null };
  });
  const state = deriveInstallState(eventRows);
  const today = dayInZone(now, company.timeZone);
  const { plan, flags } = installClock({
    state,
    resin: resinSystem ? resinClockSpec(resinSystem) : null,
    packer: packer ? { minPressureKpa: packer.minPressureKpa, maxPressureKpa: packer.maxPressureKpa } : null,
    resinKitExpiresOn: resinKit?.expiresOn ?? null,
    safetyMargin: company.workingWindowSafetyMargin,
    holdReserve: company.holdReserve,
    timeZone: company.timeZone,
    unitSystem: company.unitSystem,
    now,
  });
  const chain = await redoChainOf(user, installColumns);
  const patchLengthMm =
    repair.plannedPatchLengthMm ?? ruledPatchLength(repair.defectLengthMm, company.minOverlapPerEndMm);

  return {
    install: installColumns,
    /** The install this one redoes, and the redo that replaced it (the redo chain of the repair). */
    chain,
    events: eventRows,
    state,
    plan,
    flags,
    repair: { ...repairColumns, segment, accessPoint: fromAccessPoint ?? segmentStart ?? null },
    job: {
      id: job.id,
      number: job.number,
      title: job.title,
      site: { addressLine: job.site.addressLine, city: job.site.city },
    },
    resinSystem,
    resinKit,
    packer,
    options: {
      resinKits: kits.map((kit) => ({
        ...(kit.get({ plain: true }) as ResinKitWithSystem),
        expired: kit.expiresOn < today,
      })),
      patchLengthMm,
      packers:
        patchLengthMm === null
          ? []
          : packerFits(packers, segment.insideDiameterMm, patchLengthMm, company.unitSystem as UnitSystem),
      checklist: checklistTemplate
        ? { id: checklistTemplate.id, name: checklistTemplate.name, items: checklistTemplate.items }
        : null,
    },
    company: {
      unitSystem: company.unitSystem,
      timeZone: company.timeZone,
      workingWindowSafetyMargin: company.workingWindowSafetyMargin,
      holdReserve: company.holdReserve,
      minOverlapPerEndMm: company.minOverlapPerEndMm,
    },
    serverTime: now.toISOString(),
  };
}

/**
 * The install of the caller's company (404 otherwise, and for a missing one); a field user
 * outside the crew doing it gets 403. The crew of the job counts too, should the office reassign it.
 */
export async function findInstallFor(user: SessionUser, id: string): Promise<Install> {
  const install = await Install.findOne({
    where: { id, companyId: user.companyId },
    include: [{ model: Job, as: 'job', attributes: ['crewId'] }],
  });
  if (!install) throw notFound('Install');
  const job = (install as Install & { job?: Pick<Job, 'crewId'> }).job;
  if (!mayWorkOn(user, [install.crewId, job?.crewId])) throw forbidden('This install belongs to another crew.');
  return install;
}

type ResinKitWithSystem = Plain<ResinKit> & { resinSystem: Plain<ResinSystem> };

type InstallDetail = InstallRow & {
  repair: Plain<Repair> & {
    segment: Plain<Segment> & { fromAccessPoint: Plain<AccessPoint> | null };
    fromAccessPoint: Plain<AccessPoint> | null;
  };
  job: Plain<Job> & { site: Pick<Plain<Site>, 'addressLine' | 'city'> };
  resinSystem: Plain<ResinSystem> | null;
  resinKit: Plain<ResinKit> | null;
  packer: Plain<Packer> | null;
  checklistTemplate: Plain<ChecklistTemplate> | null;
};

async function findExisting(user: SessionUser, input: CreateInstallInput): Promise<InstallRow | null> {
  // By id alone: ids are global, so one taken by another company is a conflict too (without saying whose).
  const existing = await Install.findByPk(input.id);
  if (!existing) return null;
  if (existing.companyId !== user.companyId || existing.repairId !== input.repairId) {
    throw new AppError(409, 'That install id is already used for another repair.');
  }
  return existing.get({ plain: true });
}

function packerFits(packers: Packer[], insideDiameterMm: number, patchLengthMm: number, system: UnitSystem) {
  const fleet = packers.map((p) => ({ id: p.id, name: p.name, serial: p.serial, ...packerSizesOf(p) }));
  try {
    const fits = fittingPackers(fleet, { insideDiameterMm, patchLengthMm }, system);
    return fleet.map((packer, i) => ({
      ...packer,
      fits: fits[i].fits,
      endMarginEachMm: fits[i].endMarginEachMm,
      reasons: fits[i].reasons,
      reasonDetails: fits[i].reasonDetails,
    }));
  } catch (error) {
    // A packer row or repair the sizing cannot read must not take the install screen down.
    if (error instanceof SizingInputError) return [];
    throw error;
  }
}

/** The company's overlap rule when the office planned no length; never throws on odd data. */
function ruledPatchLength(defectLengthMm: number, overlapPerEndMm: number): number | null {
  try {
    return patchLength({ defectLengthMm, overlapPerEndMm });
  } catch (error) {
    if (error instanceof SizingInputError) return null;
    throw error;
  }
}

/** The answers of POST /api/installs/:id/events and POST /api/installs. */
export type RecordEventResponse = { event: InstallEventRow };
export type CreateInstallResponse = { install: InstallRow };
