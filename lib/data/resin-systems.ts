import 'server-only';
import type { z } from 'zod';
import { Install, ResinKit, ResinSystem } from '@/models';
import { sequelize } from '@/lib/data/db';
import { notFound } from '@/lib/server/errors';
import type { SessionUser } from '@/lib/auth/session';
import {
  resinSystemProblems,
  type ResinSystemInput,
  type ResinSystemListQuery,
  type resinSystemPatchSchema,
} from '@/lib/validation/resin-systems';
import { throwProblems } from '@/lib/validation/rules';
import { allOf, archivedWhere, pageOf, searchWhere, windowOf } from './list';
import { assertAdmin } from './scope';
import { archiveOrDelete, createAudited, lockOwnRow, updateAudited } from './records';

const ENTITY = 'resin_system';

export type ResinSystemListResponse = Awaited<ReturnType<typeof listResinSystems>>;

/** A page of the company's resin systems; every signed-in user of the company may read them (the crew's clock needs them). */
export async function listResinSystems(user: SessionUser, query: ResinSystemListQuery, exportAll = false) {
  const { rows, count } = await ResinSystem.findAndCountAll({
    where: allOf(
      { companyId: user.companyId },
      archivedWhere(query.archived),
      query.chemistry ? { chemistry: query.chemistry } : undefined,
      searchWhere(query.q, ['name']),
    ),
    order: [
      [query.sort, query.dir.toUpperCase()],
      ['id', 'ASC'],
    ],
    ...windowOf(query, exportAll),
  });
  return pageOf(
    rows.map((row) => row.get({ plain: true })),
    count,
    query,
  );
}

export type ResinSystemResponse = Awaited<ReturnType<typeof getResinSystem>>;

/** One resin system with how many kits and installs name it. */
export async function getResinSystem(user: SessionUser, id: string) {
  const row = await ResinSystem.findOne({ where: { id, companyId: user.companyId } });
  if (!row) throw notFound('Resin system');
  const [kitCount, installCount] = await Promise.all([
    ResinKit.count({ where: { companyId: user.companyId, resinSystemId: id } }),
    Install.count({ where: { companyId: user.companyId, resinSystemId: id } }),
  ]);
  return { ...row.get({ plain: true }), kitCount, installCount };
}

export async function createResinSystem(user: SessionUser, input: ResinSystemInput) {
  assertAdmin(user);
  const values = withOneSensitivity(input);
  return createAudited(user, ResinSystem, ENTITY, values);
}

/** A partial edit; the cross-field rules are checked on the record as it will be (400 and nothing written otherwise). */
export async function updateResinSystem(user: SessionUser, id: string, patch: z.output<typeof resinSystemPatchSchema>) {
  assertAdmin(user);
  return sequelize.transaction(async (transaction) => {
    const row = await lockOwnRow(ResinSystem, user, id, 'Resin system', transaction);
    const next = { ...row.get({ plain: true }), ...patch };
    throwProblems(resinSystemProblems(next));
    const sensitivity = withOneSensitivity(next);
    return updateAudited(
      user,
      row,
      ENTITY,
      { ...patch, doublingC: sensitivity.doublingC, activationEnergyKj: sensitivity.activationEnergyKj },
      transaction,
    );
  });
}

/** Archives a resin system that kits or installs name (their history must stay readable), deletes an unused one. */
export async function archiveResinSystem(user: SessionUser, id: string) {
  assertAdmin(user);
  return sequelize.transaction(async (transaction) => {
    const row = await lockOwnRow(ResinSystem, user, id, 'Resin system', transaction);
    const [kits, installs] = await Promise.all([
      ResinKit.count({ where: { companyId: user.companyId, resinSystemId: id }, transaction }),
      Install.count({ where: { companyId: user.companyId, resinSystemId: id }, transaction }),
    ]);
    return archiveOrDelete(
      user,
      row,
      {
        entityType: ENTITY,
        inUse: kits + installs > 0,
        summary: { name: row.name },
      },
      transaction,
    );
  });
}

// The clock reads only the figure of the chosen kind; the other is cleared so the record says one thing.
function withOneSensitivity<
  T extends { sensitivityKind: string; doublingC?: number | null; activationEnergyKj?: number | null },
>(values: T) {
  return values.sensitivityKind === 'arrhenius'
    ? { ...values, doublingC: null, activationEnergyKj: values.activationEnergyKj ?? null }
    : { ...values, doublingC: values.doublingC ?? null, activationEnergyKj: null };
}
