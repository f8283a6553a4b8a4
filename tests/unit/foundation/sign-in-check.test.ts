import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { signInSchema } from '@/lib/validation/auth';
import { checkSignIn } from '@/lib/validation/sign-in-check';

// The sign-in page checks without zod; the server checks with signInSchema. Both must accept the
// same input, normalise it alike and give the same message per field.
function viaSchema(input: { email: string; password: string }) {
  const parsed = signInSchema.safeParse(input);
  if (parsed.success) return { ok: true as const, values: parsed.data };
  const errors: Record<string, string> = {};
  for (const issue of parsed.error.issues) errors[String(issue.path[0])] ??= issue.message;
  return { ok: false as const, errors };
}

const emailish = fc.oneof(
  fc.emailAddress(),
  fc.emailAddress().map((e) => `  ${e.toUpperCase()} `),
  fc.string(),
  fc.constantFrom(
    '',
    ' ',
    'a@b',
    'a@b.c',
    'a@b.co',
    '.a@b.co',
    'a.@b.co',
    'a..b@c.de',
    "o'neil@x.org",
    'x@-a.org',
    'x@a-.org',
    'é@x.org',
  ),
);
const passwordish = fc.oneof(
  fc.string({ maxLength: 5 }),
  fc.string({ minLength: 195, maxLength: 205 }),
  fc.constant(''),
);

describe('checkSignIn', () => {
  it('agrees with signInSchema on every input', () => {
    fc.assert(
      fc.property(emailish, passwordish, (email, password) => {
        expect(checkSignIn({ email, password })).toEqual(viaSchema({ email, password }));
      }),
      { numRuns: 2000 },
    );
  });

  it('trims and lower-cases the e-mail, keeps the password as typed', () => {
    expect(checkSignIn({ email: ' Foreman@Demo.Test ', password: ' pw ' })).toEqual({
      ok: true,
      values: { email: 'foreman@demo.test', password: ' pw ' },
    });
    expect(checkSignIn({ email: 'nope', password: '' })).toEqual({
      ok: false,
      errors: { email: 'Enter the e-mail address you sign in with', password: 'Enter your password' },
    });
  });
});
