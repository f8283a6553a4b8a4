import 'server-only';
import type { Transaction } from 'sequelize';
import type { z } from 'zod';
import { Install, Packer } from '@/models';
import type { SessionUser } from '@/lib/auth/session';
import {
  packerProblems,
  type PackerInput,
  type PackerListQuery,
  type packerPatchSchema,
} from '@/lib/validation/packers';
import { throwProblems } from '@/lib/validation/rules';
import { allOf, archivedWhere, searchWhere } from './list';
import { markDerivedStale } from './install-derive';
import { plainPage, settingsRecord } from './records';

const packers = settingsRecord(Packer, 'packer', 'Packer');
const installsOf = (user: SessionUser, packerId: string, transaction?: Transaction) =>
  Install.count({ where: { companyId: user.companyId, packerId }, transaction });

/** A packer's sizes and pressure rating, as lib/sizing and lib/planning read them (SI). */
export function packerSizesOf(packer: Packer) {
  return {
    minDiameterMm: packer.minDiameterMm,
    maxDiameterMm: packer.maxDiameterMm,
    bladderLengthMm: packer.bladderLengthMm,
    endMarginMm: packer.endMarginMm,
    minPressureKpa: packer.minPressureKpa,
    maxPressureKpa: packer.maxPressureKpa,
  };
}

export type PackerListResponse = Awaited<ReturnType<typeof listPackers>>;

/** A page of the company's packers; every signed-in user of the company may read them (the crew picks one on site). */
export async function listPackers(user: SessionUser, query: PackerListQuery, exportAll = false) {
  const where = allOf(
    { companyId: user.companyId },
    archivedWhere(query.archived),
    searchWhere(query.q, ['name', 'serial']),
  );
  return plainPage(Packer, where, query, exportAll);
}

export type PackerResponse = Awaited<ReturnType<typeof getPacker>>;

export async function getPacker(user: SessionUser, id: string) {
  const packer = await packers.find(user, id);
  return { ...packer, installCount: await installsOf(user, id) };
}

export async function createPacker(user: SessionUser, input: PackerInput) {
  return packers.create(user, input);
}

/** A partial edit; ranges are checked on the packer as it will be (400 and nothing written otherwise). */
export async function updatePacker(user: SessionUser, id: string, patch: z.output<typeof packerPatchSchema>) {
  return packers.update(
    user,
    id,
    (row) => {
      throwProblems(packerProblems({ ...row.get({ plain: true }), ...patch }));
      return patch;
    },
    async (transaction) => {
      // Only the rating is read by the flags (pressure readings against it).
      if (patch.minPressureKpa !== undefined || patch.maxPressureKpa !== undefined)
        await markDerivedStale(user.companyId, { column: 'packerId', id }, transaction);
    },
  );
}

/** Archives a packer an install used, deletes an unused one. */
export async function archivePacker(user: SessionUser, id: string) {
  return packers.archive(user, id, (transaction) => installsOf(user, id, transaction));
}
