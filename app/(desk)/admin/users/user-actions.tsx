'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Input } from '@/components/ui/input';
import { Button } from '@/components/ui/button';
import { submitJson } from '@/lib/client/submit-json';
import { passwordResetSchema } from '@/lib/validation/users';
import { cn } from '@/lib/ui/cn';

type Target = { id: string; name: string; active: boolean };

/** A user row's actions: deactivate / reactivate, and set a new password (both end the user's sessions). */
export function UserActions({ user, isSelf }: { user: Target; isSelf: boolean }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [resetting, setResetting] = useState(false);
  const [message, setMessage] = useState<{ ok: boolean; text: string }>();

  const toggleActive = async () => {
    setBusy(true);
    setMessage(undefined);
    const result = await submitJson(`/api/users/${user.id}`, 'PATCH', { active: !user.active });
    setBusy(false);
    if (!result.ok) return setMessage({ ok: false, text: result.error.message });
    setMessage({
      ok: true,
      text: user.active ? `${user.name} is deactivated and signed out.` : `${user.name} can sign in again.`,
    });
    router.refresh();
  };

  return (
    <div className="flex flex-col gap-1">
      <div className="flex flex-wrap gap-2">
        {!isSelf && (
          <Button
            type="button"
            variant="secondary"
            onClick={toggleActive}
            disabled={busy}
            aria-label={`${user.active ? 'Deactivate' : 'Reactivate'} ${user.name}`}
          >
            {user.active ? 'Deactivate' : 'Reactivate'}
          </Button>
        )}
        <Button
          type="button"
          variant="ghost"
          onClick={() => setResetting((open) => !open)}
          aria-expanded={resetting}
          aria-label={`Reset password ${user.name}`}
        >
          Reset password
        </Button>
      </div>
      {resetting && (
        <PasswordForm
          user={user}
          onDone={(text) => {
            setResetting(false);
            setMessage({ ok: true, text });
          }}
        />
      )}
      {message && (
        <p
          role={message.ok ? 'status' : 'alert'}
          className={cn('text-xs font-medium', message.ok ? 'text-safe-700' : 'text-missed-700')}
        >
          {message.text}
        </p>
      )}
    </div>
  );
}

function PasswordForm({ user, onDone }: { user: Target; onDone: (message: string) => void }) {
  const [failure, setFailure] = useState<string>();
  const {
    register,
    handleSubmit,
    formState: { errors, isSubmitting },
  } = useForm<z.input<typeof passwordResetSchema>>({ resolver: zodResolver(passwordResetSchema) });
  const id = `password-${user.id}`;
  const error = errors.password?.message ?? failure;
  const onSubmit = handleSubmit(async (values) => {
    const result = await submitJson(`/api/users/${user.id}/password`, 'POST', values);
    if (!result.ok) return setFailure(result.error.fields?.password?.[0] ?? result.error.message);
    onDone(`New password set; ${user.name} is signed out everywhere.`);
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-wrap items-start gap-2 text-sm">
      <label htmlFor={id} className="sr-only">
        New password for {user.name}
      </label>
      <Input
        id={id}
        type="password"
        autoComplete="new-password"
        placeholder="New password (12+ characters)"
        {...register('password')}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
      />
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? 'Saving…' : 'Save password'}
      </Button>
      {error && (
        <p id={`${id}-error`} role="alert" className="w-full text-xs font-medium text-missed-700">
          {error}
        </p>
      )}
    </form>
  );
}
