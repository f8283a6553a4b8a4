import 'server-only';
import { Op, UniqueConstraintError, type Transaction } from 'sequelize';
import { Crew, CrewMember, Install, Job, User } from '@/models';
import { sequelize } from '@/lib/data/db';
import { changedFields, recordAudit } from '@/lib/data/audit';
import { AppError, notFound } from '@/lib/server/errors';
import { isDeskRole } from '@/lib/auth/roles';
import { FIELD_ROLES } from '@/lib/domain/vocabulary';
import type { SessionUser } from '@/lib/auth/session';
import type { CrewListQuery, crewInputSchema, crewPatchSchema } from '@/lib/validation/crews';
import type { z } from 'zod';
import { allOf, archivedWhere, pageOf, searchWhere, windowOf } from './list';
import { assertAdmin } from './scope';
import { archiveOrDelete } from './records';

const ENTITY = 'crew';

type Member = { id: string; name: string; role: string; active: boolean };

/** Desk users see every crew of the company; field users only the crews they belong to. */
function visibleCrews(user: SessionUser) {
  return isDeskRole(user.role) ? undefined : { id: { [Op.in]: user.crewIds } };
}

export type CrewListResponse = Awaited<ReturnType<typeof listCrews>>;

/** A page of crews, each with its members. */
export async function listCrews(user: SessionUser, query: CrewListQuery, exportAll = false) {
  const where = allOf(
    { companyId: user.companyId },
    archivedWhere(query.archived),
    searchWhere(query.q, ['name']),
    visibleCrews(user),
  );
  const { rows, count } = await Crew.findAndCountAll({
    where,
    order: [
      [query.sort, query.dir.toUpperCase()],
      ['id', 'ASC'],
    ],
    ...windowOf(query, exportAll),
  });
  const members = await membersOf(
    user,
    rows.map((row) => row.id),
  );
  return pageOf(
    rows.map((row) => ({ ...row.get({ plain: true }), members: members.get(row.id) ?? [] })),
    count,
    query,
  );
}

export type CrewResponse = Awaited<ReturnType<typeof getCrew>>;

/** One crew with its members; 404 when it is another company's or (for field users) not theirs. */
export async function getCrew(user: SessionUser, id: string) {
  const crew = await Crew.findOne({ where: allOf({ id, companyId: user.companyId }, visibleCrews(user)) });
  if (!crew) throw notFound('Crew');
  const members = await membersOf(user, [id]);
  return { ...crew.get({ plain: true }), members: members.get(id) ?? [] };
}

/** The people who can be put on a crew: the company's active foremen and technicians. */
export async function listCrewCandidates(user: SessionUser) {
  assertAdmin(user);
  const rows = await User.findAll({
    where: { companyId: user.companyId, role: { [Op.in]: [...FIELD_ROLES] }, active: true },
    attributes: ['id', 'name', 'role', 'active'],
    order: [['name', 'ASC']],
  });
  return rows.map((row) => row.get({ plain: true }) as Member);
}

export async function createCrew(user: SessionUser, input: z.output<typeof crewInputSchema>) {
  assertAdmin(user);
  return uniqueName(() =>
    sequelize.transaction(async (transaction) => {
      const crew = await Crew.create({ ...input, companyId: user.companyId }, { transaction });
      await recordAudit(user, { action: 'create', entityType: ENTITY, entityId: crew.id, changes: input }, transaction);
      return { ...crew.get({ plain: true }), members: [] as Member[] };
    }),
  );
}

export async function updateCrew(user: SessionUser, id: string, patch: z.output<typeof crewPatchSchema>) {
  assertAdmin(user);
  const { archived, ...fields } = patch;
  return uniqueName(() =>
    sequelize.transaction(async (transaction) => {
      const crew = await lockCrew(user, id, transaction);
      const changes = changedFields(crew.get({ plain: true }), fields);
      const restore = archived === false && crew.archivedAt !== null;
      if (Object.keys(changes).length || restore) {
        await crew.update({ ...fields, ...(restore ? { archivedAt: null } : {}) }, { transaction });
        await recordAudit(
          user,
          { action: restore ? 'restore' : 'update', entityType: ENTITY, entityId: id, changes },
          transaction,
        );
      }
      return crew.get({ plain: true });
    }),
  );
}

/** Archives a crew that has jobs (their history names it) and deletes one that has none. */
export async function archiveCrew(user: SessionUser, id: string) {
  assertAdmin(user);
  return sequelize.transaction(async (transaction) => {
    const crew = await lockCrew(user, id, transaction);
    const where = { crewId: id, companyId: user.companyId };
    const [jobs, installs] = await Promise.all([
      Job.count({ where, transaction }),
      Install.count({ where, transaction }),
    ]);
    // A deleted crew's memberships go with it (ON DELETE CASCADE).
    return archiveOrDelete(
      user,
      crew,
      { entityType: ENTITY, inUse: jobs + installs > 0, summary: { name: crew.name } },
      transaction,
    );
  });
}

/**
 * Replaces the crew's members. Each must be a foreman or technician of the company (422 otherwise) and
 * active, unless already on the crew; an archived crew takes no changes (409).
 */
export async function setCrewMembers(user: SessionUser, id: string, userIds: string[]) {
  assertAdmin(user);
  return sequelize.transaction(async (transaction) => {
    const crew = await lockCrew(user, id, transaction);
    if (crew.archivedAt) throw new AppError(409, 'This crew is archived: restore it before changing its members.');
    const current = (
      await CrewMember.findAll({
        where: { crewId: id, companyId: user.companyId },
        attributes: ['userId'],
        transaction,
      })
    ).map((m) => m.userId);
    const found = await User.findAll({
      where: { id: { [Op.in]: userIds }, companyId: user.companyId },
      attributes: ['id', 'name', 'role', 'active'],
      transaction,
    });
    const byId = new Map(found.map((row) => [row.id, row]));
    const refused = userIds.filter((userId) => {
      const row = byId.get(userId);
      return !row || !FIELD_ROLES.includes(row.role) || (!row.active && !current.includes(userId));
    });
    if (refused.length) {
      throw new AppError(422, 'Only active foremen and technicians of this company can be on a crew.', {
        userIds: refused.map((userId) => `${userId} cannot be on a crew`),
      });
    }
    const added = userIds.filter((userId) => !current.includes(userId));
    const removed = current.filter((userId) => !userIds.includes(userId));
    if (removed.length) await CrewMember.destroy({ where: { crewId: id, userId: { [Op.in]: removed } }, transaction });
    if (added.length)
      await CrewMember.bulkCreate(
        added.map((userId) => ({ companyId: user.companyId, crewId: id, userId })),
        { transaction },
      );
    if (added.length || removed.length) {
      await recordAudit(
        user,
        { action: 'members', entityType: ENTITY, entityId: id, changes: { added, removed } },
        transaction,
      );
    }
    return { ...crew.get({ plain: true }), members: (await membersOf(user, [id], transaction)).get(id) ?? [] };
  });
}

async function lockCrew(user: SessionUser, id: string, transaction: Transaction) {
  const crew = await Crew.findOne({
    where: { id, companyId: user.companyId },
    transaction,
    lock: transaction.LOCK.UPDATE,
  });
  if (!crew) throw notFound('Crew');
  return crew;
}

/** Members of the given crews, by crew id, each list sorted by name. */
async function membersOf(user: SessionUser, crewIds: string[], transaction?: Transaction) {
  const byCrew = new Map<string, Member[]>();
  if (!crewIds.length) return byCrew;
  const rows = await CrewMember.findAll({
    where: { crewId: { [Op.in]: crewIds }, companyId: user.companyId },
    include: [{ model: User, as: 'user', attributes: ['id', 'name', 'role', 'active'] }],
    order: [[{ model: User, as: 'user' }, 'name', 'ASC']],
    transaction,
  });
  for (const row of rows) {
    const member = (row.get({ plain: true }) as unknown as { user: Member }).user;
    byCrew.set(row.crewId, [...(byCrew.get(row.crewId) ?? []), member]);
  }
  return byCrew;
}

/** A crew name is unique within the company (unique index): a clash is a 409 with the field named. */
async function uniqueName<T>(write: () => Promise<T>): Promise<T> {
  try {
    return await write();
  } catch (error) {
    if (error instanceof UniqueConstraintError)
      throw new AppError(409, 'There is already a crew of that name.', {
        name: ['There is already a crew of that name'],
      });
    throw error;
  }
}
