import { describe, expect, it } from 'vitest';
import { signInSchema } from '@/lib/validation/auth';
import { jobListQuerySchema } from '@/lib/validation/jobs';

describe('signInSchema', () => {
  it('normalises the e-mail', () => {
    expect(signInSchema.parse({ email: '  Office@Demo.TEST ', password: 'x' }).email).toBe('office@demo.test');
  });

  it('explains a missing password and a malformed e-mail', () => {
    const result = signInSchema.safeParse({ email: 'not-an-email', password: '' });
    expect(result.success).toBe(false);
    const messages = result.error!.issues.map((i) => i.message);
    expect(messages).toContain('Enter the e-mail address you sign in with');
    expect(messages).toContain('Enter your password');
  });
});

describe('jobListQuerySchema', () => {
  it('gives defaults for an empty query string', () => {
    expect(jobListQuerySchema.parse({})).toEqual({
      page: 1,
      pageSize: 25,
      sort: 'scheduledDate',
      dir: 'desc',
      archived: 'false',
    });
  });

  it('reads numbers and a comma list of statuses from strings', () => {
    expect(jobListQuerySchema.parse({ page: '3', pageSize: '50', status: 'scheduled,in_progress' })).toMatchObject({
      page: 3,
      pageSize: 50,
      status: ['scheduled', 'in_progress'],
    });
  });

  it('refuses out-of-range pages, unknown statuses and sort keys, and bad dates', () => {
    for (const bad of [
      { page: '0' },
      { pageSize: '500' },
      { status: 'done' },
      { sort: 'password' },
      { from: '12/01/2026' },
      { crewId: 'x' },
    ]) {
      expect(jobListQuerySchema.safeParse(bad).success, JSON.stringify(bad)).toBe(false);
    }
  });
});
