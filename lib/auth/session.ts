import 'server-only';
import { redirect } from 'next/navigation';
import { User, CrewMember } from '@/models';
import { AppError, forbidden, unauthorized } from '@/lib/server/errors';
import type { Role } from '@/lib/domain/vocabulary';
import { getSessionClaims, type SessionClaims } from './claims';
import { roleAllowed } from './roles';

/** Who is asking, as every lib/data function needs it: always read fresh from the users table. */
export type SessionUser = {
  id: string;
  companyId: string;
  role: Role;
  name: string;
  email: string;
  crewIds: string[];
};

/**
 * The first line of every route handler and server action. Throws 401 without a live session
 * (no cookie, deactivated user, token version bumped) and 403 when the role is not allowed.
 */
export async function requireUser(roles?: readonly Role[]): Promise<SessionUser> {
  const user = await userFromClaims(await getSessionClaims());
  if (!user) throw unauthorized();
  if (!roleAllowed(user.role, roles)) throw forbidden();
  return user;
}

/** The same check for pages: signed-out visitors go to /sign-in, a wrong role gets the 403 page. */
export async function requirePageUser(roles?: readonly Role[]): Promise<SessionUser> {
  let user: SessionUser;
  try {
    user = await requireUser(roles);
  } catch (error) {
    if (error instanceof AppError && error.status === 401) redirect('/sign-in');
    if (error instanceof AppError && error.status === 403) redirect('/forbidden');
    throw error;
  }
  return user;
}

/** Checks the claims against the user row: the row, not the token, decides (deactivation and role changes bite at once). */
export async function userFromClaims(claims: SessionClaims | null): Promise<SessionUser | null> {
  if (!claims) return null;
  const row = await User.findOne({ where: { id: claims.sub, companyId: claims.companyId } });
  if (!row || !row.active || row.tokenVersion !== claims.tokenVersion) return null;
  const memberships = await CrewMember.findAll({ where: { userId: row.id, companyId: row.companyId }, attributes: ['crewId'] });
  return {
    id: row.id,
    companyId: row.companyId,
    role: row.role,
    name: row.name,
    email: row.email,
    crewIds: memberships.map((m) => m.crewId),
  };
}
