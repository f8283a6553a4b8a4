import { z } from 'zod';

export const signInSchema = z.object({
  email: z.string().trim().toLowerCase().pipe(z.email('Enter the e-mail address you sign in with')),
  password: z.string().min(1, 'Enter your password').max(200, 'That password is too long'),
});

export type SignInInput = z.infer<typeof signInSchema>;
