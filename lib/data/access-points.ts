import 'server-only';
import { Op, UniqueConstraintError, type Transaction } from 'sequelize';
import type { z } from 'zod';
import { AccessPoint, Repair, Segment, Site } from '@/models';
import { sequelize } from '@/lib/data/db';
import { changedFields, recordAudit } from '@/lib/data/audit';
import { AppError, notFound } from '@/lib/server/errors';
import type { SessionUser } from '@/lib/auth/session';
import type { accessPointInputSchema, accessPointPatchSchema } from '@/lib/validation/access-points';
import { assertOfficeWriter } from './scope';
import { findVisibleSite } from './sites';
import { deleteAudited, lockOwnRow } from './records';

const ENTITY = 'access_point';

/** The access points of a site the caller may read, by label. */
export async function listAccessPoints(user: SessionUser, siteId: string) {
  const site = await findVisibleSite(user, siteId);
  const rows = await AccessPoint.findAll({
    where: { siteId: site.id, companyId: user.companyId },
    order: [['label', 'ASC']],
  });
  return rows.map((row) => row.get({ plain: true }));
}

export async function createAccessPoint(
  user: SessionUser,
  siteId: string,
  input: z.output<typeof accessPointInputSchema>,
) {
  assertOfficeWriter(user);
  return sequelize.transaction(async (transaction) => {
    const site = await Site.findOne({
      where: { id: siteId, companyId: user.companyId },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!site) throw notFound('Site');
    await assertLabelFree(siteId, input.label, null, transaction);
    const point = await AccessPoint.create({ ...input, siteId, companyId: user.companyId }, { transaction }).catch(
      duplicateLabel,
    );
    await recordAudit(
      user,
      { action: 'create', entityType: ENTITY, entityId: point.id, changes: { siteId, ...input } },
      transaction,
    );
    return point.get({ plain: true });
  });
}

export async function updateAccessPoint(user: SessionUser, id: string, patch: z.output<typeof accessPointPatchSchema>) {
  assertOfficeWriter(user);
  return sequelize.transaction(async (transaction) => {
    const point = await lockOwnRow(AccessPoint, user, id, 'Access point', transaction);
    if (patch.label !== undefined) await assertLabelFree(point.siteId, patch.label, id, transaction);
    const changes = changedFields(point.get({ plain: true }), patch);
    if (Object.keys(changes).length) {
      await point.update(patch, { transaction }).catch(duplicateLabel);
      await recordAudit(user, { action: 'update', entityType: ENTITY, entityId: id, changes }, transaction);
    }
    return point.get({ plain: true });
  });
}

/**
 * Removes an access point nothing refers to. Access points have no archive: one that a segment
 * (archived or not) or a repair measures from stays, and the answer is 409 saying what uses it.
 */
export async function deleteAccessPoint(user: SessionUser, id: string, reason?: string | null) {
  assertOfficeWriter(user);
  return sequelize.transaction(async (transaction) => {
    const point = await lockOwnRow(AccessPoint, user, id, 'Access point', transaction);
    const [segments, repairs] = await Promise.all([
      Segment.findAll({
        where: { companyId: user.companyId, [Op.or]: [{ fromAccessPointId: id }, { toAccessPointId: id }] },
        attributes: ['label'],
        transaction,
      }),
      Repair.count({ where: { companyId: user.companyId, fromAccessPointId: id }, transaction }),
    ]);
    if (segments.length)
      throw new AppError(
        409,
        `Segment ${segments.map((s) => s.label).join(', ')} runs from or to ${point.label}: change or remove the segment first.`,
      );
    if (repairs)
      throw new AppError(
        409,
        `${repairs} repair${repairs === 1 ? ' is' : 's are'} measured from ${point.label}: it cannot be removed.`,
      );
    return deleteAudited(
      user,
      point,
      { entityType: ENTITY, summary: { siteId: point.siteId, label: point.label }, reason },
      transaction,
    );
  });
}

async function assertLabelFree(siteId: string, label: string, exceptId: string | null, transaction: Transaction) {
  const clash = await AccessPoint.findOne({
    where: { siteId, label, ...(exceptId ? { id: { [Op.ne]: exceptId } } : {}) },
    transaction,
  });
  if (clash) throw labelTaken(label);
}

// Two desks adding the same label at once: the unique index is the last word.
function duplicateLabel(error: unknown): never {
  if (error instanceof UniqueConstraintError) throw labelTaken();
  throw error;
}

const labelTaken = (label?: string) =>
  new AppError(409, `This site already has an access point labelled ${label ?? 'that'}.`, {
    label: ['Already used on this site — pick another label'],
  });
