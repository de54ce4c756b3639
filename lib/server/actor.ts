import type { RoleName } from '@/lib/auth/permissions';

/** Who is calling: a signed-in user, or a site API token acting with its own role. */
export type Actor =
  | { kind: 'user'; userId: string; siteId: string; role: RoleName; email: string; displayName: string }
  | { kind: 'token'; tokenId: string; siteId: string; role: RoleName; name: string };
