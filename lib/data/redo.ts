import 'server-only';
import { UniqueConstraintError } from 'sequelize';
import { ChecklistTemplate, Install, Job, Repair, sequelize } from '@/models';
import { recordAudit } from '@/lib/data/audit';
import type { SessionUser } from '@/lib/auth/session';
import { AppError, forbidden, notFound } from '@/lib/server/errors';
import type { RedoInstallInput } from '@/lib/validation/install-events';
import { findInstallFor, type InstallRow } from './installs';

/**
 * Who may start a redo: the foreman of the install's crew (the crew at the manhole decides to cut
 * out and patch again), and an admin, who in a small company often runs the crew. The office sends
 * an install back; it does not start work in a pipe. Technicians tap, they do not decide.
 */
export const REDO_ROLES = ['foreman', 'admin'] as const;

/** Why an install cannot be redone, or null when it can: only a failed inspection or a sent-back install. */
function redoProblem(install: Pick<InstallRow, 'status' | 'inspectionResult'>): string | null {
  if (install.inspectionResult === 'fail' || install.status === 'sent_back') return null;
  return 'Only an install whose inspection failed, or one the office sent back, can be redone.';
}

export type RedoInstallResponse = Awaited<ReturnType<typeof redoInstall>>;

/**
 * Starts a new install on the same repair, linked to the one it replaces; both are kept. The id may
 * be made on the device, so a retried redo finds the first (`created: false`). One redo per install.
 */
export async function redoInstall(
  user: SessionUser,
  installId: string,
  input: RedoInstallInput,
): Promise<{ install: InstallRow; created: boolean }> {
  await findInstallFor(user, installId);
  if (!(REDO_ROLES as readonly string[]).includes(user.role))
    throw forbidden('Only the foreman (or an admin) can start a redo of a patch.');
  try {
    return await sequelize.transaction(async (t) => {
      const old = await Install.findOne({
        where: { id: installId, companyId: user.companyId },
        lock: t.LOCK.UPDATE,
        transaction: t,
      });
      if (!old) throw notFound('Install');
      const existing = await Install.findOne({
        where: { replacesInstallId: old.id, companyId: user.companyId },
        transaction: t,
      });
      if (existing) {
        if (input.id && existing.id === input.id) return { install: existing.get({ plain: true }), created: false };
        throw new AppError(409, 'This install was already redone: open the redo to carry on.');
      }
      const problem = redoProblem(old);
      if (problem) throw new AppError(409, problem);
      const [repair, job] = await Promise.all([
        Repair.findOne({ where: { id: old.repairId, companyId: user.companyId }, lock: t.LOCK.UPDATE, transaction: t }),
        Job.findOne({ where: { id: old.jobId, companyId: user.companyId }, transaction: t }),
      ]);
      if (!repair || !job) throw notFound('Repair');
      if (repair.status === 'cancelled' || job.status === 'cancelled')
        throw new AppError(422, 'This repair was cancelled: there is nothing to redo.');
      if (input.id && (await Install.findByPk(input.id, { transaction: t })))
        throw new AppError(409, 'That install id is already used.');

      const checklist = await ChecklistTemplate.findOne({
        where: { companyId: user.companyId, active: true },
        order: [['updatedAt', 'DESC']],
        transaction: t,
      });
      const install = await Install.create(
        {
          ...(input.id ? { id: input.id } : {}),
          companyId: user.companyId,
          repairId: old.repairId,
          jobId: old.jobId,
          crewId: job.crewId ?? old.crewId ?? null,
          checklistTemplateId: checklist?.id ?? null,
          replacesInstallId: old.id,
        },
        { transaction: t },
      );
      // The repair waits for its new patch again; the old install keeps its record and status.
      if (repair.status !== 'planned') await repair.update({ status: 'planned' }, { transaction: t });
      await recordAudit(
        user,
        {
          action: 'install.redone',
          entityType: 'install',
          entityId: install.id,
          changes: { replacesInstallId: old.id, replacedStatus: old.status, replacedInspection: old.inspectionResult },
        },
        t,
      );
      return { install: install.get({ plain: true }), created: true };
    });
  } catch (error) {
    // Two redos of the same install raced: the unique index on replaces_install_id refused the second.
    if (error instanceof UniqueConstraintError)
      throw new AppError(409, 'This install was already redone: open the redo to carry on.');
    throw error;
  }
}

/** The installs before and after this one on the same repair: what it replaced and what replaced it. */
export async function redoChainOf(user: SessionUser, install: Pick<InstallRow, 'id' | 'replacesInstallId'>) {
  const attributes = ['id', 'status', 'inspectionResult', 'startedAt', 'finishedAt', 'createdAt'] as const;
  const [replaces, replacedBy] = await Promise.all([
    install.replacesInstallId
      ? Install.findOne({
          where: { id: install.replacesInstallId, companyId: user.companyId },
          attributes: [...attributes],
        })
      : Promise.resolve(null),
    Install.findOne({
      where: { replacesInstallId: install.id, companyId: user.companyId },
      attributes: [...attributes],
    }),
  ]);
  const brief = (row: Install | null) =>
    row
      ? {
          id: row.id,
          status: row.status,
          inspectionResult: row.inspectionResult,
          startedAt: row.startedAt,
          finishedAt: row.finishedAt,
          createdAt: row.createdAt,
        }
      : null;
  return { replaces: brief(replaces), replacedBy: brief(replacedBy) };
}

/** Every install of a repair, oldest first, each with the one it redoes: the attempts the desk shows. */
export async function listRepairAttempts(user: SessionUser, repairId: string) {
  const rows = await Install.findAll({
    where: { repairId, companyId: user.companyId },
    attributes: ['id', 'status', 'inspectionResult', 'startedAt', 'finishedAt', 'createdAt', 'replacesInstallId'],
    order: [['createdAt', 'ASC']],
  });
  return rows.map((row) => row.get({ plain: true }));
}
