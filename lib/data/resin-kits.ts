import 'server-only';
import { Op, UniqueConstraintError, type InferAttributes, type Transaction } from 'sequelize';
import type { z } from 'zod';
import { Install, Job, ResinKit, ResinSystem } from '@/models';
import { sequelize } from '@/lib/data/db';
import { recordAudit } from '@/lib/data/audit';
import { dayInZone } from '@/lib/time/dates';
import { AppError, notFound } from '@/lib/server/errors';
import { isDeskRole } from '@/lib/auth/roles';
import type { SessionUser } from '@/lib/auth/session';
import {
  resinKitProblems,
  type ResinKitInput,
  type ResinKitListQuery,
  type resinKitPatchSchema,
} from '@/lib/validation/resin-kits';
import { throwProblems } from '@/lib/validation/rules';
import { getCompany } from './company';
import { allOf, archivedWhere, pageOf, searchWhere, windowOf } from './list';
import { assertAdmin } from './scope';
import { markDerivedStale } from './install-derive';
import { archiveOrDelete, lockOwnRow, updateAudited } from './records';

const ENTITY = 'resin_kit';
const systemName = { model: ResinSystem, as: 'resinSystem', attributes: ['id', 'name', 'archivedAt'] };
type KitWithSystem = InferAttributes<ResinKit> & { resinSystem: { id: string; name: string; archivedAt: Date | null } };

export type ResinKitListResponse = Awaited<ReturnType<typeof listResinKits>>;

/** A page of the company's kits, each with its resin system's name and whether it has expired (company's calendar day). */
export async function listResinKits(user: SessionUser, query: ResinKitListQuery, exportAll = false) {
  const today = await todayOf(user);
  const { rows, count } = await ResinKit.findAndCountAll({
    where: allOf(
      { companyId: user.companyId },
      archivedWhere(query.archived),
      query.resinSystemId ? { resinSystemId: query.resinSystemId } : undefined,
      // A kit may be used through its expiry day (lib/cure/expiry.ts): expired means the day has passed.
      query.expired ? { expiresOn: query.expired === 'true' ? { [Op.lt]: today } : { [Op.gte]: today } } : undefined,
      searchWhere(query.q, ['lot', 'notes']),
    ),
    include: [systemName],
    order: [
      [query.sort, query.dir.toUpperCase()],
      ['id', 'ASC'],
    ],
    ...windowOf(query, exportAll),
  });
  return pageOf(
    rows.map((row) => withExpiry(row.get({ plain: true }) as KitWithSystem, today)),
    count,
    query,
  );
}

export type ResinKitResponse = Awaited<ReturnType<typeof getResinKit>>;

/**
 * One kit with the installs that used it, newest first (field users see only their crews' installs;
 * desk users get a link to each review).
 */
export async function getResinKit(user: SessionUser, id: string) {
  const row = await ResinKit.findOne({ where: { id, companyId: user.companyId }, include: [systemName] });
  if (!row) throw notFound('Resin kit');
  const installs = await Install.findAll({
    where: allOf(
      { companyId: user.companyId, resinKitId: id },
      isDeskRole(user.role) ? undefined : { crewId: { [Op.in]: user.crewIds } },
    ),
    attributes: ['id', 'status', 'startedAt', 'finishedAt', 'jobId'],
    include: [{ model: Job, as: 'job', attributes: ['id', 'number', 'title'] }],
    order: [
      ['startedAt', 'DESC NULLS LAST'],
      ['createdAt', 'DESC'],
    ],
  });
  return {
    ...withExpiry(row.get({ plain: true }) as KitWithSystem, await todayOf(user)),
    installs: installs.map((install) => {
      const plain = install.get({ plain: true }) as InferAttributes<Install> & {
        job: { id: string; number: string; title: string | null };
      };
      return { ...plain, reviewHref: isDeskRole(user.role) ? `/reviews/${plain.id}` : null };
    }),
  };
}

export async function createResinKit(user: SessionUser, input: ResinKitInput) {
  assertAdmin(user);
  return uniqueLot(input.lot, () =>
    sequelize.transaction(async (transaction) => {
      await assertUsableSystem(user, input.resinSystemId, transaction);
      await assertLotFree(user, input.lot, null, transaction);
      const row = await ResinKit.create({ ...input, companyId: user.companyId }, { transaction });
      await recordAudit(user, { action: 'create', entityType: ENTITY, entityId: row.id, changes: input }, transaction);
      return row.get({ plain: true });
    }),
  );
}

/** A partial edit. A kit an install used keeps its resin system: the record of that install must not change under it. */
export async function updateResinKit(user: SessionUser, id: string, patch: z.output<typeof resinKitPatchSchema>) {
  assertAdmin(user);
  return uniqueLot(patch.lot, () =>
    sequelize.transaction(async (transaction) => {
      const row = await lockOwnRow(ResinKit, user, id, 'Resin kit', transaction);
      throwProblems(resinKitProblems({ ...row.get({ plain: true }), ...patch }));
      if (patch.resinSystemId && patch.resinSystemId !== row.resinSystemId) {
        await assertUsableSystem(user, patch.resinSystemId, transaction);
        if (await usedBy(user, id, transaction))
          throw new AppError(
            409,
            'This kit is already used by an install: its resin system cannot change. Add a new kit instead.',
          );
      }
      if (patch.lot && patch.lot !== row.lot) await assertLotFree(user, patch.lot, id, transaction);
      const updated = await updateAudited(user, row, ENTITY, patch, transaction);
      // The expiry is read by the flags (a kit past its date); the resin system by the clock.
      if (patch.expiresOn !== undefined || patch.resinSystemId !== undefined)
        await markDerivedStale(user.companyId, { column: 'resinKitId', id }, transaction);
      return updated;
    }),
  );
}

/** Archives a kit an install used (it stays on that install's record), deletes an unused one. */
export async function archiveResinKit(user: SessionUser, id: string) {
  assertAdmin(user);
  return sequelize.transaction(async (transaction) => {
    const row = await lockOwnRow(ResinKit, user, id, 'Resin kit', transaction);
    return archiveOrDelete(
      user,
      row,
      {
        entityType: ENTITY,
        inUse: (await usedBy(user, id, transaction)) > 0,
        summary: { lot: row.lot },
      },
      transaction,
    );
  });
}

const usedBy = (user: SessionUser, kitId: string, transaction: Transaction) =>
  Install.count({ where: { companyId: user.companyId, resinKitId: kitId }, transaction });

const todayOf = async (user: SessionUser) => dayInZone(new Date(), (await getCompany(user)).timeZone);

function withExpiry(kit: KitWithSystem, today: string) {
  return { ...kit, expired: kit.expiresOn < today };
}

/** The kit's resin system must be one of the company's, still in use: well-formed but wrong is a 422. */
async function assertUsableSystem(user: SessionUser, resinSystemId: string, transaction: Transaction) {
  const system = await ResinSystem.findOne({ where: { id: resinSystemId, companyId: user.companyId }, transaction });
  if (!system)
    throw new AppError(422, 'That resin system was not found; choose one from the list.', {
      resinSystemId: ['Unknown resin system'],
    });
  if (system.archivedAt)
    throw new AppError(422, `${system.name} is archived: new kits need a resin system in use.`, {
      resinSystemId: ['Archived resin system'],
    });
}

async function assertLotFree(user: SessionUser, lot: string, exceptId: string | null, transaction: Transaction) {
  const clash = await ResinKit.findOne({
    where: allOf({ companyId: user.companyId, lot }, exceptId ? { id: { [Op.ne]: exceptId } } : undefined),
    transaction,
  });
  if (clash) throw duplicateLot(lot);
}

// Two admins saving the same lot at once: the unique index decides, and the loser gets the same 409.
async function uniqueLot<T>(lot: string | undefined, write: () => Promise<T>): Promise<T> {
  try {
    return await write();
  } catch (error) {
    if (error instanceof UniqueConstraintError) throw duplicateLot(lot ?? '');
    throw error;
  }
}

const duplicateLot = (lot: string) =>
  new AppError(409, `Lot ${lot} is already on the list.`, { lot: ['This lot is already on the list'] });
