// Sign-in and invitation schemas, shared by the forms (in the browser) and the routes (which take
// them through lib/validation/auth.ts). zod/mini: see lib/validation/zod-mini.ts.
import * as z from './zod-mini';

export const emailSchema = z.pipe(z.string().check(z.trim(), z.toLowerCase()), z.email('Enter a valid e-mail address').check(z.maxLength(254)));
export const passwordSchema = z.string().check(z.minLength(10, 'Use at least 10 characters'), z.maxLength(200, 'Use at most 200 characters'));

export const signInSchema = z.object({ email: emailSchema, password: z.string().check(z.minLength(1, 'Enter your password')) });
export const signInLinkSchema = z.object({ email: emailSchema });
export const acceptInvitationSchema = z
  .object({ token: z.string().check(z.minLength(10, 'The invitation link is incomplete')), password: passwordSchema, confirm: z.string() })
  .check(z.refine((v) => v.password === v.confirm, { path: ['confirm'], message: 'The two passwords differ' }));
