// The sign-in form's own check, without zod, so the sign-in page stays light. It mirrors
// signInSchema (lib/validation/auth.ts, which the server applies) message for message; a unit test
// holds the two together.

export const SIGN_IN_MESSAGES = {
  email: 'Enter the e-mail address you sign in with',
  passwordMissing: 'Enter your password',
  passwordTooLong: 'That password is too long',
} as const;

export const PASSWORD_MAX = 200;

// zod 4's default e-mail pattern (zod/v4/core regexes.ts `email`), so both sides accept the same addresses.
export const EMAIL_PATTERN =
  /^(?:[A-Za-z0-9_'+\-]+\.)*[A-Za-z0-9_'+\-]*[A-Za-z0-9_+-]@(?:[A-Za-z0-9][A-Za-z0-9\-]*\.)+[A-Za-z]{2,}$/;

export type SignInFields = { email: string; password: string };
export type SignInCheck =
  { ok: true; values: SignInFields } | { ok: false; errors: Partial<Record<keyof SignInFields, string>> };

/** The e-mail trimmed and lower-cased, as the server reads it; a message per field that fails. */
export function checkSignIn(input: SignInFields): SignInCheck {
  const email = input.email.trim().toLowerCase();
  const errors: Partial<Record<keyof SignInFields, string>> = {};
  if (!EMAIL_PATTERN.test(email)) errors.email = SIGN_IN_MESSAGES.email;
  if (input.password.length < 1) errors.password = SIGN_IN_MESSAGES.passwordMissing;
  else if (input.password.length > PASSWORD_MAX) errors.password = SIGN_IN_MESSAGES.passwordTooLong;
  return Object.keys(errors).length ? { ok: false, errors } : { ok: true, values: { email, password: input.password } };
}
