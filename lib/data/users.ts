import 'server-only';
import bcrypt from 'bcryptjs';
import { UniqueConstraintError, type Transaction } from 'sequelize';
import { Crew, CrewMember, User } from '@/models';
import { sequelize } from '@/lib/data/db';
import { changedFields, recordAudit } from '@/lib/data/audit';
import { AppError, notFound } from '@/lib/server/errors';
import { isDeskRole } from '@/lib/auth/roles';
import type { SessionUser } from '@/lib/auth/session';
import type { UserListQuery, UserPatch, userInputSchema } from '@/lib/validation/users';
import type { z } from 'zod';
import { allOf, pageOf, searchWhere, windowOf } from './list';
import { assertAdmin } from './scope';

const ENTITY = 'user';
/** The same cost as the demo accounts and the sign-in check's dummy hash. */
const BCRYPT_COST = 12;

/** What the API shows of a user: never the password hash or the token version. */
const PUBLIC_ATTRIBUTES = ['id', 'companyId', 'email', 'name', 'role', 'active', 'createdAt', 'updatedAt'] as const;
export type PublicUser = Pick<User, (typeof PUBLIC_ATTRIBUTES)[number]>;
const publicUser = (row: User): PublicUser => {
  const plain = row.get({ plain: true });
  return Object.fromEntries(PUBLIC_ATTRIBUTES.map((key) => [key, plain[key]])) as PublicUser;
};

export type UserListResponse = Awaited<ReturnType<typeof listUsers>>;

/** A page of the company's users (admin only). */
export async function listUsers(user: SessionUser, query: UserListQuery, exportAll = false) {
  assertAdmin(user);
  const where = allOf(
    { companyId: user.companyId },
    query.role ? { role: query.role } : undefined,
    query.active ? { active: query.active === 'true' } : undefined,
    searchWhere(query.q, ['name', 'email']),
  );
  const { rows, count } = await User.findAndCountAll({
    where,
    attributes: [...PUBLIC_ATTRIBUTES],
    order: [
      [query.sort, query.dir.toUpperCase()],
      ['id', 'ASC'],
    ],
    ...windowOf(query, exportAll),
  });
  return pageOf(rows.map(publicUser), count, query);
}

export type UserResponse = Awaited<ReturnType<typeof getUser>>;

/** One user of the caller's company with the crews they belong to (admin only). */
export async function getUser(user: SessionUser, id: string) {
  assertAdmin(user);
  const row = await User.findOne({ where: { id, companyId: user.companyId }, attributes: [...PUBLIC_ATTRIBUTES] });
  if (!row) throw notFound('User');
  const crews = await Crew.findAll({
    attributes: ['id', 'name', 'archivedAt'],
    include: [{ model: User, as: 'members', attributes: [], where: { id }, through: { attributes: [] } }],
    where: { companyId: user.companyId },
    order: [['name', 'ASC']],
  });
  return {
    ...publicUser(row),
    crews: crews.map((crew) => ({ id: crew.id, name: crew.name, archivedAt: crew.archivedAt ?? null })),
  };
}

export async function createUser(user: SessionUser, input: z.output<typeof userInputSchema>) {
  assertAdmin(user);
  const { password, ...fields } = input;
  const passwordHash = await bcrypt.hash(password, BCRYPT_COST);
  try {
    return await sequelize.transaction(async (transaction) => {
      // E-mail is the sign-in name across all companies; the unique index is the final word.
      if (await User.count({ where: { email: fields.email }, transaction })) throw emailTaken();
      const row = await User.create({ ...fields, passwordHash, companyId: user.companyId }, { transaction });
      await recordAudit(user, { action: 'create', entityType: ENTITY, entityId: row.id, changes: fields }, transaction);
      return publicUser(row);
    });
  } catch (error) {
    if (error instanceof UniqueConstraintError) throw emailTaken();
    throw error;
  }
}

/**
 * Rename, change the role, deactivate or reactivate. A role change or a deactivation ends the user's
 * sessions at once (token version bumped, so even a later reactivation does not revive an old cookie).
 * Nobody may deactivate or demote themselves, and the company always keeps one active admin.
 */
export async function updateUser(user: SessionUser, id: string, patch: UserPatch) {
  assertAdmin(user);
  return sequelize.transaction(async (transaction) => {
    // Admins are locked first, always in the same order, so two admins demoting each other cannot deadlock.
    const admins =
      patch.role !== undefined || patch.active !== undefined ? await lockActiveAdmins(user, transaction) : [];
    const row = await lockUser(user, id, transaction);
    const changes = changedFields(row.get({ plain: true }), patch);
    const losesAdmin = row.role === 'admin' && row.active && ('role' in changes || changes.active?.to === false);
    if (losesAdmin && id === user.id)
      throw new AppError(409, 'You cannot deactivate yourself or take away your own admin role.');
    if (losesAdmin && admins.filter((adminId) => adminId !== id).length === 0) {
      throw new AppError(409, 'This is the last active admin: make someone else an admin first.');
    }
    if (!Object.keys(changes).length) return publicUser(row);
    const endSessions = 'role' in changes || changes.active?.to === false;
    await row.update({ ...patch, ...(endSessions ? { tokenVersion: row.tokenVersion + 1 } : {}) }, { transaction });
    // Crews are made of field users; someone moved to the desk leaves their crews.
    if (patch.role && isDeskRole(patch.role)) {
      const left = await CrewMember.destroy({ where: { userId: id, companyId: user.companyId }, transaction });
      if (left) Object.assign(changes, { crews: { from: `${left} crew(s)`, to: 'none' } });
    }
    const action = changes.active ? (patch.active ? 'reactivate' : 'deactivate') : 'update';
    await recordAudit(user, { action, entityType: ENTITY, entityId: id, changes }, transaction);
    return publicUser(row);
  });
}

/** The admin sets a new password; every session the user had ends. */
export async function resetPassword(user: SessionUser, id: string, password: string) {
  assertAdmin(user);
  const passwordHash = await bcrypt.hash(password, BCRYPT_COST);
  return sequelize.transaction(async (transaction) => {
    const row = await lockUser(user, id, transaction);
    await row.update({ passwordHash, tokenVersion: row.tokenVersion + 1 }, { transaction });
    await recordAudit(
      user,
      { action: 'password_reset', entityType: ENTITY, entityId: id, changes: { sessionsEnded: true } },
      transaction,
    );
    return publicUser(row);
  });
}

async function lockUser(user: SessionUser, id: string, transaction: Transaction) {
  const row = await User.findOne({
    where: { id, companyId: user.companyId },
    transaction,
    lock: transaction.LOCK.UPDATE,
  });
  if (!row) throw notFound('User');
  return row;
}

/** The ids of the company's active admins, row-locked in id order. */
async function lockActiveAdmins(user: SessionUser, transaction: Transaction) {
  const rows = await User.findAll({
    where: { companyId: user.companyId, role: 'admin', active: true },
    attributes: ['id'],
    order: [['id', 'ASC']],
    transaction,
    lock: transaction.LOCK.UPDATE,
  });
  return rows.map((row) => row.id);
}

const emailTaken = () =>
  new AppError(409, 'That e-mail already belongs to an account.', {
    email: ['That e-mail already belongs to an account'],
  });
