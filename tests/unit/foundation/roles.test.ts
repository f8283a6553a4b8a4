import { describe, expect, it } from 'vitest';
import { homeFor, isDeskRole, isFieldRole, roleAllowed } from '@/lib/auth/roles';
import { ROLES } from '@/lib/domain/vocabulary';

describe('role helpers', () => {
  it('sends each role to its own home', () => {
    expect(ROLES.map(homeFor)).toEqual(['/admin', '/jobs', '/today', '/today']);
  });

  it('allows any role when no list is given, and only the listed roles otherwise', () => {
    for (const role of ROLES) {
      expect(roleAllowed(role)).toBe(true);
      expect(roleAllowed(role, [])).toBe(true);
    }
    expect(roleAllowed('technician', ['admin', 'office'])).toBe(false);
    expect(roleAllowed('office', ['admin', 'office'])).toBe(true);
  });

  it('splits desk and field roles without overlap', () => {
    expect(ROLES.filter(isDeskRole)).toEqual(['admin', 'office']);
    expect(ROLES.filter(isFieldRole)).toEqual(['foreman', 'technician']);
  });
});
