// Admin schemas shared by the admin panels (in the browser) and the routes (which take them through
// lib/validation/admin.ts). zod/mini: see lib/validation/zod-mini.ts.
import { emailSchema } from './auth-forms';
import * as z from './zod-mini';

export const roleSchema = z.enum(['technician', 'supervisor', 'admin'], { message: 'Choose technician, supervisor or admin' });

export const inviteUserSchema = z.object({
  email: emailSchema,
  displayName: z.string().check(z.trim(), z.minLength(2, 'Give a name of at least 2 characters'), z.maxLength(120)),
  role: roleSchema,
});

export const createTokenSchema = z.object({
  name: z.string().check(z.trim(), z.minLength(2, 'Name the token (at least 2 characters)'), z.maxLength(120)),
  role: z.enum(['technician', 'supervisor'], { message: 'A token acts as a technician or a supervisor' }),
});
