import 'server-only';
import type { Transaction } from 'sequelize';
import type { z } from 'zod';
import { Install, ResinKit, ResinSystem } from '@/models';
import type { SessionUser } from '@/lib/auth/session';
import {
  resinSystemProblems,
  type ResinSystemInput,
  type ResinSystemListQuery,
  type resinSystemPatchSchema,
} from '@/lib/validation/resin-systems';
import { throwProblems } from '@/lib/validation/rules';
import { allOf, archivedWhere, searchWhere } from './list';
import { markDerivedStale } from './install-derive';
import { plainPage, settingsRecord } from './records';

const resinSystems = settingsRecord(ResinSystem, 'resin_system', 'Resin system');
/** How many kits and installs name the resin system. */
const usesOf = (user: SessionUser, resinSystemId: string, transaction?: Transaction) =>
  Promise.all([
    ResinKit.count({ where: { companyId: user.companyId, resinSystemId }, transaction }),
    Install.count({ where: { companyId: user.companyId, resinSystemId }, transaction }),
  ]);

export type ResinSystemListResponse = Awaited<ReturnType<typeof listResinSystems>>;

/** A page of the company's resin systems; every signed-in user of the company may read them (the crew's clock needs them). */
export async function listResinSystems(user: SessionUser, query: ResinSystemListQuery, exportAll = false) {
  const where = allOf(
    { companyId: user.companyId },
    archivedWhere(query.archived),
    query.chemistry ? { chemistry: query.chemistry } : undefined,
    searchWhere(query.q, ['name']),
  );
  return plainPage(ResinSystem, where, query, exportAll);
}

export type ResinSystemResponse = Awaited<ReturnType<typeof getResinSystem>>;

/** One resin system with how many kits and installs name it. */
export async function getResinSystem(user: SessionUser, id: string) {
  const system = await resinSystems.find(user, id);
  const [kitCount, installCount] = await usesOf(user, id);
  return { ...system, kitCount, installCount };
}

export async function createResinSystem(user: SessionUser, input: ResinSystemInput) {
  return resinSystems.create(user, withOneSensitivity(input));
}

/** A partial edit; the cross-field rules are checked on the record as it will be (400 and nothing written otherwise). */
export async function updateResinSystem(user: SessionUser, id: string, patch: z.output<typeof resinSystemPatchSchema>) {
  return resinSystems.update(
    user,
    id,
    (row) => {
      const next = { ...row.get({ plain: true }), ...patch };
      throwProblems(resinSystemProblems(next));
      const sensitivity = withOneSensitivity(next);
      return { ...patch, doublingC: sensitivity.doublingC, activationEnergyKj: sensitivity.activationEnergyKj };
    },
    async (transaction) => {
      // Its name and chemistry are only words; every other field is read by the clock.
      if (Object.keys(patch).some((key) => key !== 'name' && key !== 'chemistry'))
        await markDerivedStale(user.companyId, { column: 'resinSystemId', id }, transaction);
    },
  );
}

/** Archives a resin system that kits or installs name (their history must stay readable), deletes an unused one. */
export async function archiveResinSystem(user: SessionUser, id: string) {
  return resinSystems.archive(user, id, async (transaction) => {
    const [kits, installs] = await usesOf(user, id, transaction);
    return kits + installs;
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
