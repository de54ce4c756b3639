import { z } from 'zod';
import { emailSchema } from './auth';

export const roleSchema = z.enum(['technician', 'supervisor', 'admin'], { message: 'Choose technician, supervisor or admin' });

export const inviteUserSchema = z.object({
  email: emailSchema,
  displayName: z.string().trim().min(2, 'Give a name of at least 2 characters').max(120),
  role: roleSchema,
});

export const updateUserSchema = z
  .object({ role: roleSchema.optional(), status: z.enum(['active', 'deactivated']).optional() })
  .refine((v) => v.role !== undefined || v.status !== undefined, { message: 'Change the role or the status' });

export const createTokenSchema = z.object({
  name: z.string().trim().min(2, 'Name the token (at least 2 characters)').max(120),
  role: z.enum(['technician', 'supervisor'], { message: 'A token acts as a technician or a supervisor' }),
});
