'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { FormField, errorProps } from '@/components/desk/form-field';
import { Input, Select } from '@/components/ui/input';
import { Button } from '@/components/ui/button';
import { applyServerErrors, submitJson } from '@/lib/client/submit-json';
import { ROLES, label } from '@/lib/domain/vocabulary';
import { PASSWORD_MIN_LENGTH, userInputSchema, userPatchSchema } from '@/lib/validation/users';
import { cn } from '@/lib/ui/cn';
import { cardClass } from '@/components/ui/card';

type NewInput = z.input<typeof userInputSchema>;
// A disabled control sends nothing, so your own role is simply left out of the PATCH.
const editSchema = userPatchSchema.omit({ active: true });
type EditInput = z.input<typeof editSchema>;

/** A new user: name, e-mail, role and a first password. The same schema as POST /api/users. */
export function NewUserForm() {
  const router = useRouter();
  const [message, setMessage] = useState<string>();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<NewInput>({
    resolver: zodResolver(userInputSchema),
    defaultValues: { name: '', email: '', role: 'technician', password: '' },
  });
  const onSubmit = handleSubmit(async (values) => {
    const result = await submitJson<{ id: string }>('/api/users', 'POST', values);
    if (!result.ok) return setMessage(applyServerErrors(result.error, setError));
    router.push('/admin/users');
    router.refresh();
  });
  return (
    <form onSubmit={onSubmit} noValidate className={cn(cardClass, 'grid max-w-2xl gap-4 md:grid-cols-2')}>
      <FormField id="name" label="Name" error={errors.name?.message}>
        <Input {...register('name')} {...errorProps('name', errors.name?.message)} autoFocus />
      </FormField>
      <FormField id="email" label="E-mail" error={errors.email?.message} hint="They sign in with this address.">
        <Input type="email" autoComplete="off" {...register('email')} {...errorProps('email', errors.email?.message)} />
      </FormField>
      <RoleSelect register={register('role')} error={errors.role?.message} />
      <FormField
        id="password"
        label="Initial password"
        error={errors.password?.message}
        hint={`At least ${PASSWORD_MIN_LENGTH} characters; hand it over in person.`}
      >
        <Input
          type="password"
          autoComplete="new-password"
          {...register('password')}
          {...errorProps('password', errors.password?.message)}
        />
      </FormField>
      {message && (
        <p role="alert" className="text-sm font-medium text-missed-700 md:col-span-2">
          {message}
        </p>
      )}
      <div className="flex gap-2 md:col-span-2">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? 'Creating…' : 'Create user'}
        </Button>
        <Button type="button" variant="secondary" onClick={() => router.back()}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

/** Rename or change the role (PATCH /api/users/:id); a role change signs the user out. */
export function EditUserForm({
  user,
  isSelf,
}: {
  user: { id: string; name: string; role: NewInput['role'] };
  isSelf: boolean;
}) {
  const router = useRouter();
  const [message, setMessage] = useState<{ ok: boolean; text: string }>();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<EditInput>({
    resolver: zodResolver(editSchema),
    defaultValues: { name: user.name, role: user.role },
  });
  const onSubmit = handleSubmit(async (values) => {
    const result = await submitJson(`/api/users/${user.id}`, 'PATCH', values);
    if (!result.ok) return setMessage({ ok: false, text: applyServerErrors(result.error, setError) });
    setMessage({
      ok: true,
      text:
        values.role && values.role !== user.role
          ? 'Saved; the user was signed out and signs in again with the new role.'
          : 'Saved.',
    });
    router.refresh();
  });
  return (
    <form onSubmit={onSubmit} noValidate className={cn(cardClass, 'grid max-w-2xl gap-4 md:grid-cols-2')}>
      <FormField id="name" label="Name" error={errors.name?.message}>
        <Input {...register('name')} {...errorProps('name', errors.name?.message)} />
      </FormField>
      <RoleSelect
        register={register('role')}
        error={errors.role?.message}
        disabled={isSelf}
        hint={isSelf ? 'You cannot change your own role.' : undefined}
      />
      {message && (
        <p
          role={message.ok ? 'status' : 'alert'}
          className={cn('text-sm font-medium md:col-span-2', message.ok ? 'text-safe-700' : 'text-missed-700')}
        >
          {message.text}
        </p>
      )}
      <div className="md:col-span-2">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? 'Saving…' : 'Save changes'}
        </Button>
      </div>
    </form>
  );
}

function RoleSelect({
  register,
  error,
  disabled,
  hint,
}: {
  register: ReturnType<ReturnType<typeof useForm<EditInput>>['register']>;
  error?: string;
  disabled?: boolean;
  hint?: string;
}) {
  return (
    <FormField id="role" label="Role" error={error} hint={hint}>
      <Select {...register} {...errorProps('role', error)} disabled={disabled}>
        {ROLES.map((role) => (
          <option key={role} value={role}>
            {label(role)}
          </option>
        ))}
      </Select>
    </FormField>
  );
}
