import 'server-only';
import { Op, type InferAttributes, type Model, type Transaction } from 'sequelize';
import { AccessPoint, Company, Install, Job, Packer, Repair, ResinSystem, Segment } from '@/models';
import { sequelize } from '@/lib/data/db';
import { changedFields, recordAudit } from '@/lib/data/audit';
import { AppError, notFound } from '@/lib/server/errors';
import { REPAIRS_EDITABLE } from '@/lib/jobs/status';
import { PLAN_CAUTION, planRepair } from '@/lib/planning/plan-repair';
import { fittingPackers, patchLength } from '@/lib/sizing';
import { convertPressure, formatLength, type UnitSystem } from '@/lib/units';
import type { SessionUser } from '@/lib/auth/session';
import type { RepairInput, RepairListQuery, RepairPatch, RepairPlanQuery } from '@/lib/validation/repairs';
import { unprocessable } from './jobs';
import { allOf, pageOf, searchWhere, windowOf } from './list';
import { assertOfficeWriter, crewJobsWhere } from './scope';
import { deleteAudited, findOwnRowLocked, lockOwnRow } from './records';
import { packerSizesOf } from './packers';

type Plain<M extends Model> = InferAttributes<M>;
const ENTITY = 'repair';

export type RepairListItem = Plain<Repair> & {
  job: Pick<Plain<Job>, 'id' | 'number' | 'status' | 'title'>;
  segment: Pick<Plain<Segment>, 'id' | 'label' | 'insideDiameterMm' | 'lengthMm'>;
};

export type RepairDetail = Plain<Repair> & {
  job: Pick<Plain<Job>, 'id' | 'number' | 'status' | 'title' | 'siteId' | 'archivedAt'>;
  segment: Plain<Segment> & { fromAccessPoint: Pick<Plain<AccessPoint>, 'id' | 'label' | 'kind'> | null };
  plannedPacker: Pick<Plain<Packer>, 'id' | 'name'> | null;
  installCount: number;
};

export type RepairListResponse = Awaited<ReturnType<typeof listRepairs>>;

/**
 * A page of the caller's repairs (field users: of their crews' jobs). A cancelled repair counts as archived:
 * hidden unless `archived` or the status filter asks for it.
 */
export async function listRepairs(user: SessionUser, query: RepairListQuery, exportAll = false) {
  const cancelled =
    query.archived === 'only'
      ? { status: 'cancelled' }
      : query.archived === 'true' || query.status?.length
        ? undefined
        : { status: { [Op.ne]: 'cancelled' } };
  const where = allOf(
    { companyId: user.companyId },
    cancelled,
    query.status?.length ? { status: { [Op.in]: query.status } } : undefined,
    query.jobId ? { jobId: query.jobId } : undefined,
    query.segmentId ? { segmentId: query.segmentId } : undefined,
    searchWhere(query.q, ['notes', 'defectType', 'clockPosition', '$job.number$', '$segment.label$']),
    crewJobsWhere(user, 'jobId', 'id'),
  );
  const { rows, count } = await Repair.findAndCountAll({
    where,
    include: [
      { model: Job, as: 'job', attributes: ['id', 'number', 'status', 'title'] },
      { model: Segment, as: 'segment', attributes: ['id', 'label', 'insideDiameterMm', 'lengthMm'] },
    ],
    order: [
      [query.sort, query.dir.toUpperCase()],
      [{ model: Job, as: 'job' }, 'number', 'DESC'],
      ['position', 'ASC'],
      ['id', 'ASC'],
    ],
    ...windowOf(query, exportAll),
    distinct: true,
  });
  return pageOf(
    rows.map((row) => row.get({ plain: true }) as RepairListItem),
    count,
    query,
  );
}

export type RepairResponse = Awaited<ReturnType<typeof getRepair>>;

/** One repair with its job, segment, chosen packer and install count; 404 when it is not the caller's to see. */
export async function getRepair(user: SessionUser, id: string): Promise<RepairDetail> {
  const repair = await Repair.findOne({
    where: allOf({ id, companyId: user.companyId }, crewJobsWhere(user, 'jobId', 'id')),
    include: [
      { model: Job, as: 'job', attributes: ['id', 'number', 'status', 'title', 'siteId', 'archivedAt'] },
      {
        model: Segment,
        as: 'segment',
        include: [{ model: AccessPoint, as: 'fromAccessPoint', attributes: ['id', 'label', 'kind'] }],
      },
    ],
  });
  if (!repair) throw notFound('Repair');
  const [packer, installCount] = await Promise.all([
    repair.plannedPackerId
      ? Packer.findOne({ where: { id: repair.plannedPackerId, companyId: user.companyId }, attributes: ['id', 'name'] })
      : null,
    Install.count({ where: { repairId: id, companyId: user.companyId } }),
  ]);
  const plain = repair.get({ plain: true }) as Omit<RepairDetail, 'plannedPacker' | 'installCount'>;
  return { ...plain, plannedPacker: packer ? { id: packer.id, name: packer.name } : null, installCount };
}

/** The job a new repair goes on and the segments of its site, for the repair form. */
export async function repairFormOptions(user: SessionUser, jobId: string) {
  assertOfficeWriter(user);
  const job = await Job.findOne({
    where: { id: jobId, companyId: user.companyId },
    attributes: ['id', 'number', 'title', 'siteId', 'status', 'archivedAt'],
  });
  if (!job) throw notFound('Job');
  const segments = await Segment.findAll({
    where: { siteId: job.siteId, companyId: user.companyId, archivedAt: null },
    attributes: ['id', 'label', 'insideDiameterMm', 'lengthMm'],
    order: [['label', 'ASC']],
  });
  return { job: job.get({ plain: true }), segments: segments.map((s) => s.get({ plain: true })) };
}

/** Adds a repair at the end of its job's list. The segment must lie on the job's site (422). */
export async function createRepair(user: SessionUser, input: RepairInput) {
  assertOfficeWriter(user);
  return sequelize.transaction(async (transaction) => {
    // The job row's lock makes concurrent adds queue, so positions stay 1, 2, 3…
    const job = await findOwnRowLocked(Job, user, input.jobId, transaction);
    if (!job) throw unprocessable('jobId', 'Pick one of your jobs.');
    assertJobOpen(job);
    const segment = await segmentOnSite(user, input.segmentId, job.siteId, transaction);
    const company = await Company.findByPk(user.companyId, { attributes: ['unitSystem'], transaction });
    assertWithinSegment(input.distanceMm, segment, (company?.unitSystem ?? 'metric') as UnitSystem);
    const last = (await Repair.max<number, Repair>('position', { where: { jobId: job.id }, transaction })) ?? 0;
    const repair = await Repair.create(
      { ...input, companyId: user.companyId, fromAccessPointId: segment.fromAccessPointId, position: last + 1 },
      { transaction },
    );
    await recordAudit(
      user,
      { action: 'create', entityType: ENTITY, entityId: repair.id, changes: { ...input, position: last + 1 } },
      transaction,
    );
    return repair.get({ plain: true });
  });
}

/**
 * Edits a repair. Notes may always change; the defect and the plan only while the job is open and no install
 * has started on the repair (409). Status moves between planned and cancelled only.
 */
export async function updateRepair(user: SessionUser, id: string, patch: RepairPatch) {
  assertOfficeWriter(user);
  return sequelize.transaction(async (transaction) => {
    const repair = await lockOwnRow(Repair, user, id, 'Repair', transaction);
    const job = await Job.findOne({ where: { id: repair.jobId, companyId: user.companyId }, transaction });
    if (!job) throw notFound('Repair');
    const changes = changedFields(repair.get({ plain: true }), patch);
    // Notes and the owner's defect code are words about the repair, not its plan: they may always change.
    const beyondNotes = Object.keys(changes).filter((field) => field !== 'notes' && field !== 'ownerDefectCode');
    if (beyondNotes.length === 0) {
      if (changes.notes || changes.ownerDefectCode) {
        const words = Object.fromEntries(
          Object.keys(changes).map((field) => [field, patch[field as 'notes' | 'ownerDefectCode']]),
        );
        await repair.update(words, { transaction });
        await recordAudit(user, { action: 'update', entityType: ENTITY, entityId: id, changes }, transaction);
      }
      return repair.get({ plain: true });
    }

    assertJobOpen(job);
    if (await Install.count({ where: { repairId: id }, transaction })) {
      throw new AppError(409, 'A crew has started an install of this repair: only its notes can change now.');
    }
    if (changes.status && repair.status !== 'planned' && repair.status !== 'cancelled') {
      throw new AppError(409, `An ${repair.status} repair cannot be set to ${patch.status}.`);
    }

    const updates: Partial<Plain<Repair>> = { ...patch };
    let segment = await Segment.findOne({ where: { id: repair.segmentId, companyId: user.companyId }, transaction });
    if (changes.segmentId) {
      segment = await segmentOnSite(user, patch.segmentId!, job.siteId, transaction);
      updates.fromAccessPointId = segment.fromAccessPointId;
    }
    if (!segment) throw notFound('Segment');
    const company = await Company.findByPk(user.companyId, { transaction });
    if (!company) throw notFound('Company');
    const system = company.unitSystem as UnitSystem;
    if (changes.segmentId || changes.distanceMm)
      assertWithinSegment(patch.distanceMm ?? repair.distanceMm, segment, system);

    const packerId = patch.plannedPackerId === undefined ? repair.plannedPackerId : patch.plannedPackerId;
    if (
      packerId &&
      (changes.plannedPackerId || changes.plannedPatchLengthMm || changes.segmentId || changes.defectLengthMm)
    ) {
      const patchMm =
        (patch.plannedPatchLengthMm === undefined ? repair.plannedPatchLengthMm : patch.plannedPatchLengthMm) ??
        patchLength({
          defectLengthMm: patch.defectLengthMm ?? repair.defectLengthMm,
          overlapPerEndMm: company.minOverlapPerEndMm,
        });
      await assertPackerFits(user, packerId, segment.insideDiameterMm, patchMm, system, transaction);
    }

    await repair.update(updates, { transaction });
    await recordAudit(
      user,
      { action: changes.status ? statusAction(patch.status!) : 'update', entityType: ENTITY, entityId: id, changes },
      transaction,
    );
    return repair.get({ plain: true });
  });
}

/**
 * Cancels a repair that an install has started on (its record stays for the report and review) and deletes
 * one that has none, moving the later repairs of the job up one place.
 */
export async function removeRepair(user: SessionUser, id: string, reason?: string | null) {
  assertOfficeWriter(user);
  return sequelize.transaction(async (transaction) => {
    const repair = await lockOwnRow(Repair, user, id, 'Repair', transaction);
    if (await Install.count({ where: { repairId: id }, transaction })) {
      if (repair.status !== 'cancelled') {
        await repair.update({ status: 'cancelled' }, { transaction });
        await recordAudit(
          user,
          {
            action: 'archive',
            entityType: ENTITY,
            entityId: id,
            changes: { status: { from: repair.status, to: 'cancelled' } },
            reason,
          },
          transaction,
        );
      }
      return { id, archived: true, deleted: false, status: 'cancelled' as const };
    }
    await Job.findOne({ where: { id: repair.jobId }, transaction, lock: transaction.LOCK.UPDATE });
    const deleted = await deleteAudited(
      user,
      repair,
      { entityType: ENTITY, summary: { jobId: repair.jobId, position: repair.position }, reason },
      transaction,
    );
    await Repair.decrement('position', {
      by: 1,
      where: { jobId: repair.jobId, position: { [Op.gt]: repair.position } },
      transaction,
    });
    return deleted;
  });
}

/**
 * The planning panel of a repair: the query's what-if values, else what the office saved, else the defaults
 * of lib/planning. Everything SI; the page shows it in the company's units.
 */
export async function getRepairPlan(user: SessionUser, id: string, query: RepairPlanQuery) {
  const repair = await getRepair(user, id);
  const [company, packers, resinSystems] = await Promise.all([
    Company.findByPk(user.companyId),
    Packer.findAll({
      where: { companyId: user.companyId, archivedAt: null },
      order: [
        ['minDiameterMm', 'ASC'],
        ['bladderLengthMm', 'ASC'],
        ['name', 'ASC'],
      ],
    }),
    ResinSystem.findAll({
      where: { companyId: user.companyId, archivedAt: null },
      attributes: ['id', 'name', 'resinToFabricRatio', 'resinExcessPct'],
      order: [
        ['name', 'ASC'],
        ['id', 'ASC'],
      ],
    }),
  ]);
  if (!company) throw notFound('Company');
  // The resin the quantity is for: the one asked about (of this company only), else the first in use by name.
  const resin = query.resinSystemId ? resinSystems.find((r) => r.id === query.resinSystemId) : resinSystems[0];
  if (query.resinSystemId && !resin) throw unprocessable('resinSystemId', 'Pick one of your resin systems.');
  const inputs = {
    insideDiameterMm: repair.segment.insideDiameterMm,
    defectLengthMm: repair.defectLengthMm,
    overlapPerEndMm: company.minOverlapPerEndMm,
    patchLengthMm: query.patchLengthMm ?? repair.plannedPatchLengthMm,
    thicknessMm: query.thicknessMm ?? repair.plannedThicknessMm,
    groundwaterHeadMm: query.groundwaterHeadMm ?? repair.plannedGroundwaterHeadMm,
    ovalityPct: query.ovalityPct ?? repair.plannedOvalityPct,
    longTermModulusPsi:
      query.longTermModulusMpa === undefined ? null : convertPressure(query.longTermModulusMpa * 1000, 'kPa', 'psi'),
    // The modulus asked about, else the company's, else (in the planner) the F1216 Table 1 minimum.
    shortTermModulusPsi: modulusPsi(query.shortTermModulusMpa ?? company.linerShortTermModulusMpa),
  };
  const unitSystem = company.unitSystem as UnitSystem;
  const plan = planRepair({
    ...inputs,
    unitSystem,
    resin: resin
      ? {
          id: resin.id,
          name: resin.name,
          resinToFabricRatio: resin.resinToFabricRatio,
          excessPct: resin.resinExcessPct,
        }
      : null,
    packers: packers.map((p) => ({ id: p.id, name: p.name, ...packerSizesOf(p) })),
  });
  return {
    repairId: repair.id,
    unitSystem,
    inputs,
    resinSystems: resinSystems.map((r) => ({ id: r.id, name: r.name })),
    saved: {
      plannedPatchLengthMm: repair.plannedPatchLengthMm,
      plannedPackerId: repair.plannedPackerId,
      plannedThicknessMm: repair.plannedThicknessMm,
      plannedGroundwaterHeadMm: repair.plannedGroundwaterHeadMm,
      plannedOvalityPct: repair.plannedOvalityPct,
    },
    ...plan,
    caution: PLAN_CAUTION,
  };
}
export type RepairPlanResponse = Awaited<ReturnType<typeof getRepairPlan>>;

function assertJobOpen(job: Job) {
  if (job.archivedAt) throw new AppError(409, 'This job is archived: its repairs can no longer change.');
  if (!REPAIRS_EDITABLE.includes(job.status)) {
    throw new AppError(409, `The job is ${job.status.replace(/_/g, ' ')}: its repairs can no longer change.`);
  }
}

async function segmentOnSite(user: SessionUser, segmentId: string, siteId: string, transaction: Transaction) {
  const segment = await Segment.findOne({ where: { id: segmentId, companyId: user.companyId }, transaction });
  if (!segment || segment.siteId !== siteId)
    throw unprocessable('segmentId', 'That segment is not on this job’s site.');
  if (segment.archivedAt) throw unprocessable('segmentId', 'That segment is archived.');
  return segment;
}

function assertWithinSegment(distanceMm: number, segment: Segment, system: UnitSystem) {
  if (distanceMm > segment.lengthMm) {
    throw unprocessable(
      'distanceMm',
      `The segment is only ${formatLength(segment.lengthMm, system, 'long')} long: the defect must lie within it.`,
    );
  }
}

async function assertPackerFits(
  user: SessionUser,
  packerId: string,
  insideDiameterMm: number,
  patchLengthMm: number,
  system: UnitSystem,
  transaction: Transaction,
) {
  const packer = await Packer.findOne({
    where: { id: packerId, companyId: user.companyId, archivedAt: null },
    transaction,
  });
  if (!packer) throw unprocessable('plannedPackerId', 'Pick one of your packers.');
  const [fit] = fittingPackers([packer.get({ plain: true })], { insideDiameterMm, patchLengthMm }, system);
  if (!fit.fits) throw unprocessable('plannedPackerId', `${packer.name} does not fit: ${fit.reasons.join(' ')}`);
}

const statusAction = (status: 'planned' | 'cancelled') => (status === 'cancelled' ? 'cancel' : 'restore');

/** MPa → psi for the F1216 checks (1 psi = 6.894 757 kPa, NIST SP 811 App. B); none stays none. */
const modulusPsi = (mpa: number | null | undefined) => (mpa == null ? null : convertPressure(mpa * 1000, 'kPa', 'psi'));
