import { z } from 'zod';

export const emailSchema = z
  .string({ error: 'e-mail is required' })
  .trim()
  .toLowerCase()
  .max(254, 'e-mail must be at most 254 characters')
  .pipe(z.email({ error: 'enter a valid e-mail address' }));

export const passwordSchema = z
  .string({ error: 'password is required' })
  .min(10, 'password must be at least 10 characters')
  .max(200, 'password must be at most 200 characters');

export const personNameSchema = z.string({ error: 'name is required' }).trim().min(1, 'name is required').max(120, 'name must be at most 120 characters');

export const signUpSchema = z.object({ name: personNameSchema, email: emailSchema, password: passwordSchema });
export const signInSchema = z.object({ email: emailSchema, password: z.string().min(1, 'password is required').max(200) });
export const resetRequestSchema = z.object({ email: emailSchema });
export const resetConfirmSchema = z.object({ token: z.string().min(20, 'the reset link is not complete').max(100), password: passwordSchema });

export type SignUpInput = z.infer<typeof signUpSchema>;
