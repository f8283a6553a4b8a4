import 'server-only';
import type { z } from 'zod';
import { Install, Packer } from '@/models';
import { sequelize } from '@/lib/data/db';
import { notFound } from '@/lib/server/errors';
import type { SessionUser } from '@/lib/auth/session';
import {
  packerProblems,
  type PackerInput,
  type PackerListQuery,
  type packerPatchSchema,
} from '@/lib/validation/packers';
import { throwProblems } from '@/lib/validation/rules';
import { allOf, archivedWhere, pageOf, searchWhere, windowOf } from './list';
import { assertAdmin } from './scope';
import { archiveOrDelete, createAudited, lockOwnRow, updateAudited } from './records';

const ENTITY = 'packer';

export type PackerListResponse = Awaited<ReturnType<typeof listPackers>>;

/** A page of the company's packers; every signed-in user of the company may read them (the crew picks one on site). */
export async function listPackers(user: SessionUser, query: PackerListQuery, exportAll = false) {
  const { rows, count } = await Packer.findAndCountAll({
    where: allOf(
      { companyId: user.companyId },
      archivedWhere(query.archived),
      searchWhere(query.q, ['name', 'serial']),
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

export type PackerResponse = Awaited<ReturnType<typeof getPacker>>;

export async function getPacker(user: SessionUser, id: string) {
  const row = await Packer.findOne({ where: { id, companyId: user.companyId } });
  if (!row) throw notFound('Packer');
  return {
    ...row.get({ plain: true }),
    installCount: await Install.count({ where: { companyId: user.companyId, packerId: id } }),
  };
}

export async function createPacker(user: SessionUser, input: PackerInput) {
  assertAdmin(user);
  return createAudited(user, Packer, ENTITY, input);
}

/** A partial edit; ranges are checked on the packer as it will be (400 and nothing written otherwise). */
export async function updatePacker(user: SessionUser, id: string, patch: z.output<typeof packerPatchSchema>) {
  assertAdmin(user);
  return sequelize.transaction(async (transaction) => {
    const row = await lockOwnRow(Packer, user, id, 'Packer', transaction);
    throwProblems(packerProblems({ ...row.get({ plain: true }), ...patch }));
    return updateAudited(user, row, ENTITY, patch, transaction);
  });
}

/** Archives a packer an install used, deletes an unused one. */
export async function archivePacker(user: SessionUser, id: string) {
  assertAdmin(user);
  return sequelize.transaction(async (transaction) => {
    const row = await lockOwnRow(Packer, user, id, 'Packer', transaction);
    const installs = await Install.count({ where: { companyId: user.companyId, packerId: id }, transaction });
    return archiveOrDelete(
      user,
      row,
      { entityType: ENTITY, inUse: installs > 0, summary: { name: row.name } },
      transaction,
    );
  });
}
