import { DESK_ROLES, FIELD_ROLES, type Role } from '@/lib/domain/vocabulary';

/** Where each role starts after signing in. */
export function homeFor(role: Role): string {
  switch (role) {
    case 'admin':
      return '/admin';
    case 'office':
      return '/jobs';
    case 'foreman':
    case 'technician':
      return '/today';
  }
}

/** True when the role is allowed; no list means any signed-in role. */
export function roleAllowed(role: Role, allowed?: readonly Role[]): boolean {
  return !allowed || allowed.length === 0 || allowed.includes(role);
}

export const isDeskRole = (role: Role) => DESK_ROLES.includes(role);
export const isFieldRole = (role: Role) => FIELD_ROLES.includes(role);
