import { z } from 'zod';

export const emailSchema = z.string().trim().toLowerCase().pipe(z.email('Enter a valid e-mail address').max(254));
export const passwordSchema = z
  .string()
  .min(10, 'Use at least 10 characters')
  .max(200, 'Use at most 200 characters');

export const signInSchema = z.object({ email: emailSchema, password: z.string().min(1, 'Enter your password') });
export const signInLinkSchema = z.object({ email: emailSchema });
export const acceptInvitationSchema = z
  .object({ token: z.string().min(10, 'The invitation link is incomplete'), password: passwordSchema, confirm: z.string() })
  .refine((v) => v.password === v.confirm, { path: ['confirm'], message: 'The two passwords differ' });
