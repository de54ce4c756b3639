// Admin schemas as the routes take them (classic zod). The ones the admin panels share are in
// admin-forms.ts (zod/mini), handed to the routes through lib/validation/for-routes.ts.
import { z } from 'zod';
import * as forms from './admin-forms';
import { forRoutes } from './for-routes';

export { roleSchema } from './admin-forms';
export const inviteUserSchema = forRoutes(forms.inviteUserSchema);
export const createTokenSchema = forRoutes(forms.createTokenSchema);

export const updateUserSchema = z
  .object({ role: z.optional(forms.roleSchema), status: z.enum(['active', 'deactivated']).optional() })
  .refine((v) => v.role !== undefined || v.status !== undefined, { message: 'Change the role or the status' });
