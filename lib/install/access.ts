import { isDeskRole } from '@/lib/auth/roles';
import type { Role } from '@/lib/domain/vocabulary';

type Caller = { role: Role; crewIds: readonly string[] };

/** The office and admins work on any install of their company; field users only on their own crews' work. */
export function mayWorkOn(user: Caller, crewIds: readonly (string | null | undefined)[]): boolean {
  if (isDeskRole(user.role)) return true;
  return crewIds.some((id) => id != null && user.crewIds.includes(id));
}

/** Signing off and overriding a no-go are the foreman's call (or the office's), not a technician's. */
export function mayDecide(user: Caller): boolean {
  return user.role !== 'technician';
}
