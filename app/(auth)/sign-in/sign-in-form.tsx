'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter, useSearchParams } from 'next/navigation';
import { useTranslations } from 'next-intl';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { safeCallbackPath } from '@/lib/auth/callback-url';
import { signInWithPassword } from '@/lib/client/sign-in';
import { signInSchema, type SignInInput } from '@/lib/validation/auth';

// One message for every failure (badCredentials), so the form never tells whether an e-mail has an account.
function failureMessage(result: { status: number; message?: string } | null, t: (key: 'badCredentials' | 'failed') => string): string {
  if (result?.status === 401) return t('badCredentials');
  // 429: the server's "Too many attempts — try again in N minutes."
  if (result?.status === 429 && result.message) return result.message;
  return t('failed');
}

export function SignInForm() {
  const t = useTranslations('signIn');
  const router = useRouter();
  const params = useSearchParams();
  const [failure, setFailure] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<SignInInput>({ resolver: zodResolver(signInSchema) });

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    const next = safeCallbackPath(params.get('callbackUrl'));
    const result = await signInWithPassword(values.email, values.password, next).catch(() => null);
    if (!result || !result.ok) {
      setFailure(failureMessage(result, t));
      return;
    }
    router.replace(next);
    router.refresh();
  });

  const { errors, isSubmitting } = formState;
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5">
      <div>
        <label htmlFor="email" className="block text-base font-medium">{t('email')}</label>
        <input
          id="email"
          type="email"
          autoComplete="username"
          inputMode="email"
          className="mt-1 block min-h-touch w-full rounded-md border border-slate-300 px-3 text-lg"
          aria-invalid={!!errors.email}
          aria-describedby={errors.email ? 'email-error' : undefined}
          {...register('email')}
        />
        {errors.email && <p id="email-error" className="mt-1 text-sm text-missed-700">{errors.email.message}</p>}
      </div>
      <div>
        <label htmlFor="password" className="block text-base font-medium">{t('password')}</label>
        <input
          id="password"
          type="password"
          autoComplete="current-password"
          className="mt-1 block min-h-touch w-full rounded-md border border-slate-300 px-3 text-lg"
          aria-invalid={!!errors.password}
          aria-describedby={errors.password ? 'password-error' : undefined}
          {...register('password')}
        />
        {errors.password && <p id="password-error" className="mt-1 text-sm text-missed-700">{errors.password.message}</p>}
      </div>
      <div role="alert" aria-live="assertive">
        {failure && <p className="rounded-md bg-missed-100 px-3 py-2 text-base text-missed-700">{failure}</p>}
      </div>
      <Button type="submit" size="field" className="w-full" disabled={isSubmitting}>
        {isSubmitting ? t('submitting') : t('submit')}
      </Button>
    </form>
  );
}
