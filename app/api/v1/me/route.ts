// GET /api/v1/me – who the caller is (a signed-in user or a site API token)
import { route } from '@/lib/server/route';

export const GET = route({ requires: 'site.read', tokens: true }, async ({ actor }) => ({
  kind: actor.kind,
  siteId: actor.siteId,
  role: actor.role,
  ...(actor.kind === 'user' ? { userId: actor.userId, email: actor.email, displayName: actor.displayName } : { tokenId: actor.tokenId, name: actor.name }),
}));
