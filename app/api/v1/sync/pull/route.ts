// GET /api/v1/sync/pull – the site's changed records after a cursor, in commit order
import { NextResponse } from 'next/server';
import { pullChanges } from '@/db/access/sync-pull';
import { maybeSendConflictDigest } from '@/db/access/sync-digest';
import { requireSyncUser } from '@/db/access/sync-guard';
import { route } from '@/lib/server/route';
import { pullQuerySchema } from '@/lib/sync/protocol';

export const GET = route({ requires: 'site.read' }, async ({ req, actor, query }) => {
  const { user } = requireSyncUser(req, actor);
  const { cursor, limit } = query(pullQuerySchema);
  const page = await pullChanges(user.siteId, cursor, limit);
  void maybeSendConflictDigest(user.siteId);
  return NextResponse.json(page, { headers: { 'cache-control': 'no-store' } });
});
