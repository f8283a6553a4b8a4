import { z } from 'zod';
import { PASSWORD_MAX, SIGN_IN_MESSAGES } from './sign-in-check';

export const signInSchema = z.object({
  email: z.string().trim().toLowerCase().pipe(z.email(SIGN_IN_MESSAGES.email)),
  password: z.string().min(1, SIGN_IN_MESSAGES.passwordMissing).max(PASSWORD_MAX, SIGN_IN_MESSAGES.passwordTooLong),
});

export type SignInInput = z.infer<typeof signInSchema>;
