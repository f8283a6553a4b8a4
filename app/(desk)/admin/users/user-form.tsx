'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm, type FieldValues, type Path } from 'react-hook-form';
import type { z } from 'zod';
import { FormActions, type FormMessage } from '@/components/desk/form-actions';
import { Field, type FieldForm } from '@/components/desk/form-field';
import { useSaveRecord } from '@/components/desk/use-save-record';
import { applyServerErrors, submitJson } from '@/lib/client/submit-json';
import { ROLES, labelledOptions } from '@/lib/domain/vocabulary';
import { PASSWORD_MIN_LENGTH, userInputSchema, userPatchSchema } from '@/lib/validation/users';
import { cn } from '@/lib/ui/cn';
import { cardClass } from '@/components/ui/card';

type NewInput = z.input<typeof userInputSchema>;
// A disabled control sends nothing, so your own role is simply left out of the PATCH.
const editSchema = userPatchSchema.omit({ active: true });
type EditInput = z.input<typeof editSchema>;

/** A new user: name, e-mail, role and a first password. The same schema as POST /api/users. */
export function NewUserForm() {
  const form = useForm<NewInput>({
    resolver: zodResolver(userInputSchema),
    defaultValues: { name: '', email: '', role: 'technician', password: '' },
  });
  const { message, save } = useSaveRecord(form.setError);
  const onSubmit = form.handleSubmit((values) =>
    save({ collection: '/api/users', body: values, next: () => '/admin/users' }),
  );
  return (
    <form onSubmit={onSubmit} noValidate className={cn(cardClass, 'grid max-w-2xl gap-4 md:grid-cols-2')}>
      <Field form={form} name="name" label="Name" autoFocus />
      <Field
        form={form}
        name="email"
        label="E-mail"
        hint="They sign in with this address."
        type="email"
        autoComplete="off"
      />
      <RoleSelect form={form} />
      <Field
        form={form}
        name="password"
        label="Initial password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters; hand it over in person.`}
        type="password"
        autoComplete="new-password"
      />
      <FormActions message={message} form={form} submitLabel="Create user" pendingLabel="Creating…" cancel />
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
  const [message, setMessage] = useState<FormMessage>();
  const form = useForm<EditInput>({
    resolver: zodResolver(editSchema),
    defaultValues: { name: user.name, role: user.role },
  });
  const onSubmit = form.handleSubmit(async (values) => {
    const result = await submitJson(`/api/users/${user.id}`, 'PATCH', values);
    if (!result.ok) return setMessage({ ok: false, text: applyServerErrors(result.error, form.setError) });
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
      <Field form={form} name="name" label="Name" />
      <RoleSelect form={form} disabled={isSelf} hint={isSelf ? 'You cannot change your own role.' : undefined} />
      <FormActions message={message} form={form} submitLabel="Save changes" />
    </form>
  );
}

function RoleSelect<F extends FieldValues & { role?: NewInput['role'] }>({
  form,
  disabled,
  hint,
}: {
  form: FieldForm<F>;
  disabled?: boolean;
  hint?: string;
}) {
  return (
    <Field
      form={form}
      name={'role' as Path<F>}
      label="Role"
      disabled={disabled}
      hint={hint}
      choices={labelledOptions(ROLES)}
    />
  );
}
