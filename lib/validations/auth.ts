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

const accountEmail = emailSchema.meta({ description: 'The account’s e-mail address, at most 254 characters (trimmed, lower-cased).' });

export const signUpSchema = z.object({
  name: personNameSchema.meta({ description: 'The person’s name, 1–120 characters (trimmed); their personal workspace is named after it.' }),
  email: accountEmail,
  password: passwordSchema.meta({ description: 'The new password, 10–200 characters.' }),
});
export const signInSchema = z.object({ email: emailSchema, password: z.string().min(1, 'password is required').max(200) });
export const resetRequestSchema = z.object({ email: accountEmail });
export const resetConfirmSchema = z.object({
  token: z.string().min(20, 'the reset link is not complete').max(100).meta({ description: 'The token from the reset link (the part after /reset/); it works once, for one hour.' }),
  password: passwordSchema.meta({ description: 'The new password, 10–200 characters.' }),
});

export type SignUpInput = z.infer<typeof signUpSchema>;
