import 'server-only';
import { User } from '@/models';
import type { SessionUser } from '@/lib/auth/session';
import { sequelize } from '@/lib/data/db';
import type { ProfilePatch } from '@/lib/validation/profile';
import { lockOwnRow, updateAudited } from './records';

// A user's own settings. Only the caller's own row, of the caller's company, is ever read or written: there is
// no id in the request to point elsewhere.

export async function getProfile(user: SessionUser) {
  const row = await User.findOne({
    where: { id: user.id, companyId: user.companyId },
    attributes: ['id', 'name', 'email', 'role', 'locale'],
  });
  if (!row) throw new Error('The signed-in user has no row');
  return { id: row.id, name: row.name, email: row.email, role: row.role, locale: row.locale ?? null };
}
export type ProfileResponse = Awaited<ReturnType<typeof getProfile>>;

export async function updateProfile(user: SessionUser, patch: ProfilePatch): Promise<ProfileResponse> {
  await sequelize.transaction(async (transaction) =>
    updateAudited(user, await lockOwnRow(User, user, user.id, 'User', transaction), 'user', patch, transaction),
  );
  return getProfile(user);
}
