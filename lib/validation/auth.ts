// Sign-in and invitation schemas as the routes take them (classic zod, lib/validation/for-routes.ts).
// The schemas themselves are in auth-forms.ts, which the browser's forms import.
import * as forms from './auth-forms';
import { forRoutes } from './for-routes';

export { emailSchema, passwordSchema, signInSchema } from './auth-forms';
export const signInLinkSchema = forRoutes(forms.signInLinkSchema);
export const acceptInvitationSchema = forRoutes(forms.acceptInvitationSchema);
