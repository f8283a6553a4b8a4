'use client';

import { useRouter, useSearchParams } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { buttonVariants } from '@/components/ui/button-variants';
import { safeCallbackPath } from '@/lib/auth/callback-url';
import { signInWithPassword } from '@/lib/client/sign-in';
import { checkSignIn, SIGN_IN_MESSAGES, type SignInFields } from '@/lib/validation/sign-in-check';

/**
 * The form's words in the reader's language (the `signIn` messages), given by the page: no translation library
 * ships. `tooManyOne` and `tooManyOther` are the two plural forms English and Spanish have; the latter holds
 * `{minutes}` for the number.
 */
export type SignInWords = Record<
  'email' | 'password' | 'submit' | 'submitting' | 'badCredentials' | 'failed' | 'tooManyOne' | 'tooManyOther',
  string
> & { errors: Record<keyof typeof SIGN_IN_MESSAGES, string> };

// One message for every failure (badCredentials), so the form never tells whether an e-mail has an account.
function failureMessage(
  result: { status: number; message?: string; retryAfterSeconds?: number } | null,
  words: SignInWords,
): string {
  if (result?.status === 401) return words.badCredentials;
  // 429: "Too many attempts — try again in N minutes.", counted as lib/security/throttle.ts counts.
  if (result?.status === 429 && result.retryAfterSeconds) {
    const minutes = Math.max(1, Math.ceil(result.retryAfterSeconds / 60));
    return minutes === 1 ? words.tooManyOne : words.tooManyOther.replace('{minutes}', String(minutes));
  }
  if (result?.status === 429 && result.message) return result.message;
  return words.failed;
}

/** The check's English message (lib/validation/sign-in-check.ts) as its key in the catalogue. */
const MESSAGE_KEYS = new Map(Object.entries(SIGN_IN_MESSAGES).map(([key, text]) => [text as string, key]));

export function SignInForm({ words }: { words: SignInWords }) {
  const router = useRouter();
  const params = useSearchParams();
  const [failure, setFailure] = useState<string | null>(null);
  // A plain form with the schema's own checks (lib/validation/sign-in-check.ts): no form library on
  // the lightest page. As before, fields are checked on submit, then again as they change.
  const [errors, setErrors] = useState<Partial<Record<keyof SignInFields, string>>>({});
  const [submitted, setSubmitted] = useState(false);
  const [isSubmitting, setSubmitting] = useState(false);
  const said = (message: string) => {
    const key = MESSAGE_KEYS.get(message);
    return key ? words.errors[key as keyof typeof SIGN_IN_MESSAGES] : message;
  };

  const recheck = (form: HTMLFormElement | null, field: keyof SignInFields) => {
    if (!submitted || !form) return;
    const check = checkSignIn(fieldsOf(form));
    setErrors((current) => ({ ...current, [field]: check.ok ? undefined : check.errors[field] }));
  };

  const onSubmit = async (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    if (isSubmitting) return;
    setSubmitted(true);
    const check = checkSignIn(fieldsOf(event.currentTarget));
    if (!check.ok) {
      setErrors(check.errors);
      // Focus the first field that failed, as the form library did.
      event.currentTarget.querySelector<HTMLInputElement>(`#${check.errors.email ? 'email' : 'password'}`)?.focus();
      return;
    }
    setErrors({});
    setSubmitting(true);
    setFailure(null);
    const next = safeCallbackPath(params.get('callbackUrl'));
    const result = await signInWithPassword(check.values.email, check.values.password, next).catch(() => null);
    setSubmitting(false);
    if (!result || !result.ok) {
      setFailure(failureMessage(result, words));
      return;
    }
    router.replace(next);
    router.refresh();
  };

  return (
    <form onSubmit={(event) => void onSubmit(event)} noValidate className="space-y-5">
      <div>
        <label htmlFor="email" className="block text-base font-medium">
          {words.email}
        </label>
        <input
          id="email"
          type="email"
          autoComplete="username"
          inputMode="email"
          className="mt-1 block min-h-touch w-full rounded-md border border-slate-300 px-3 text-lg"
          aria-invalid={!!errors.email}
          aria-describedby={errors.email ? 'email-error' : undefined}
          name="email"
          onChange={(event) => recheck(event.currentTarget.form, 'email')}
        />
        {errors.email && (
          <p id="email-error" className="mt-1 text-sm text-missed-700">
            {said(errors.email)}
          </p>
        )}
      </div>
      <div>
        <label htmlFor="password" className="block text-base font-medium">
          {words.password}
        </label>
        <input
          id="password"
          type="password"
          autoComplete="current-password"
          className="mt-1 block min-h-touch w-full rounded-md border border-slate-300 px-3 text-lg"
          aria-invalid={!!errors.password}
          aria-describedby={errors.password ? 'password-error' : undefined}
          name="password"
          onChange={(event) => recheck(event.currentTarget.form, 'password')}
        />
        {errors.password && (
          <p id="password-error" className="mt-1 text-sm text-missed-700">
            {said(errors.password)}
          </p>
        )}
      </div>
      <div role="alert" aria-live="assertive">
        {failure && <p className="rounded-md bg-missed-100 px-3 py-2 text-base text-missed-700">{failure}</p>}
      </div>
      <button type="submit" className={buttonVariants({ size: 'field', className: 'w-full' })} disabled={isSubmitting}>
        {isSubmitting ? words.submitting : words.submit}
      </button>
    </form>
  );
}

function fieldsOf(form: HTMLFormElement): SignInFields {
  const data = new FormData(form);
  return { email: String(data.get('email') ?? ''), password: String(data.get('password') ?? '') };
}
