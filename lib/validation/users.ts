import { z } from 'zod';
import { ROLES } from '@/lib/domain/vocabulary';
import { blankAsUndefined } from './common';
import { listQuerySchema } from './list';

/** bcrypt reads at most 72 bytes of a password; a longer one would be cut without telling anyone. */
const BCRYPT_MAX_BYTES = 72;
export const PASSWORD_MIN_LENGTH = 12;

export const passwordSchema = z
  .string({ error: 'Enter a password' })
  .min(PASSWORD_MIN_LENGTH, `At least ${PASSWORD_MIN_LENGTH} characters`)
  .refine((value) => new TextEncoder().encode(value).length <= BCRYPT_MAX_BYTES, `At most ${BCRYPT_MAX_BYTES} bytes`);

const userFields = {
  name: z
    .string({ error: 'Enter the person’s name' })
    .trim()
    .min(1, 'Enter the person’s name')
    .max(200, 'At most 200 characters'),
  email: z
    .string({ error: 'Enter an e-mail address' })
    .trim()
    .toLowerCase()
    .max(254, 'At most 254 characters')
    .pipe(z.email('Enter an e-mail address like name@example.com')),
  role: z.enum(ROLES, { error: 'Pick a role: admin, office, foreman or technician' }),
};

/** POST /api/users and the new-user form: who, their role and a first password they change later. */
export const userInputSchema = z.object({ ...userFields, password: passwordSchema }).strict();
export type UserInput = z.input<typeof userInputSchema>;

/** PATCH /api/users/:id: rename, change role, deactivate or reactivate. The e-mail is the sign-in name and stays. */
export const userPatchSchema = z
  .object({ name: userFields.name, role: userFields.role, active: z.boolean({ error: 'active is true or false' }) })
  .partial()
  .strict();
export type UserPatch = z.output<typeof userPatchSchema>;

/** POST /api/users/:id/password: the admin sets a new password. */
export const passwordResetSchema = z.object({ password: passwordSchema }).strict();

export const USER_SORT_KEYS = ['name', 'email', 'role', 'createdAt'] as const;
export const userListQuerySchema = listQuerySchema(USER_SORT_KEYS, { sort: 'name' }).and(
  z.object({
    role: blankAsUndefined(z.enum(ROLES, { error: 'Unknown role' }).optional()),
    active: blankAsUndefined(z.enum(['true', 'false'], { error: 'active is true or false' }).optional()),
  }),
);
export type UserListQuery = z.infer<typeof userListQuerySchema>;
