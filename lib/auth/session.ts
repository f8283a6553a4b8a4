import 'server-only';
import { redirect } from 'next/navigation';
import { definePrepared, queryPrepared } from '@/lib/data/prepared';
import { AppError, forbidden, unauthorized } from '@/lib/server/errors';
import { isUuid } from '@/lib/validation/common';
import type { Locale } from '@/i18n/locales';
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
  /** The user's language setting; null follows the browser. */
  locale?: Locale | null;
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
  if (!claims || !isUuid(claims.sub) || !isUuid(claims.companyId)) return null;
  const [row] = await queryPrepared<UserRow>(USER, [claims.sub, claims.companyId]);
  return sessionUserOf(row, claims);
}

/** Who may see an install: its own crew and its job's (the office may reassign the job). */
export type InstallAccess = { id: string; crewId: string | null; jobCrewId: string | null };

/**
 * `requireUser` for a route about one install: the user, their crews and the install's crews in one query
 * (the tap's first round trip). `install` is null when the company has no such install.
 */
export async function requireUserWithInstall(
  installId: string | null,
  sessionClaims?: SessionClaims,
): Promise<{ user: SessionUser; install: InstallAccess | null }> {
  const claims = sessionClaims ?? (await getSessionClaims());
  if (!claims || !isUuid(claims.sub) || !isUuid(claims.companyId)) throw unauthorized();
  const [row] = await queryPrepared<UserWithInstallRow>(USER_WITH_INSTALL, [claims.sub, claims.companyId, installId]);
  const access = accessOf(row, claims);
  if (!access) throw unauthorized();
  return access;
}

export type UserWithInstallRow = UserRow & {
  installId: string | null;
  installCrewId: string | null;
  jobCrewId: string | null;
};

/** The user and the install's crews from a row of `USER_WITH_INSTALL`; null when the session is not live. */
export function accessOf(
  row: UserWithInstallRow | undefined,
  claims: SessionClaims,
): { user: SessionUser; install: InstallAccess | null } | null {
  const user = sessionUserOf(row, claims);
  if (!user || !row) return null;
  const install = row.installId ? { id: row.installId, crewId: row.installCrewId, jobCrewId: row.jobCrewId } : null;
  return { user, install };
}

type UserRow = {
  id: string;
  companyId: string;
  role: Role;
  name: string;
  email: string;
  active: boolean;
  tokenVersion: number;
  crewIds: string[];
  locale: Locale | null;
};

const USER_SQL = `SELECT u.id, u.company_id AS "companyId", u.role, u.name, u.email, u.active, u.token_version AS "tokenVersion", u.locale,
  ARRAY(SELECT cm.crew_id FROM crew_members cm WHERE cm.user_id = u.id AND cm.company_id = u.company_id ORDER BY cm.crew_id)
    AS "crewIds"`;

// Read on every request: prepared once per connection (lib/data/prepared.ts).
const USER = definePrepared('setline_user', `${USER_SQL} FROM users u WHERE u.id = $1 AND u.company_id = $2`);
/** The user, their crews and one install's crews ($1 user, $2 company, $3 install); the quick tap path sends it too. */
export const USER_WITH_INSTALL = definePrepared(
  'setline_user_install',
  `${USER_SQL}, i.id AS "installId", i.crew_id AS "installCrewId", j.crew_id AS "jobCrewId"
     FROM users u
     LEFT JOIN installs i ON i.id = $3 AND i.company_id = u.company_id
     LEFT JOIN jobs j ON j.id = i.job_id AND j.company_id = u.company_id
     WHERE u.id = $1 AND u.company_id = $2`,
);

function sessionUserOf(row: UserRow | undefined, claims: SessionClaims): SessionUser | null {
  if (!row || !row.active || row.tokenVersion !== claims.tokenVersion) return null;
  return {
    id: row.id,
    companyId: row.companyId,
    role: row.role,
    name: row.name,
    email: row.email,
    crewIds: row.crewIds,
    locale: row.locale ?? null,
  };
}
