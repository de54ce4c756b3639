// POST /api/v1/sync/push – accept a batch of device changes
import { applyPush } from '@/db/access/sync-push';
import { maybeSendConflictDigest } from '@/db/access/sync-digest';
import { requireSyncUser } from '@/db/access/sync-guard';
import { route } from '@/lib/server/route';
import { leaveOutSentContent, PROTOCOL_HEADER, protocolOf, pushRequestSchema, SYNC_PROTOCOL, type PushResponse } from '@/lib/sync/protocol';

export const POST = route({ requires: 'sheet.write' }, async ({ req, actor, body }) => {
  const user = requireSyncUser(req, actor);
  const request = await body(pushRequestSchema);
  const outcomes = await applyPush(user, request);
  await maybeSendConflictDigest(user.siteId);
  // Protocol 2 and later: no record content sent back that the device sent (protocol-version.ts).
  const speaks = protocolOf(req.headers.get(PROTOCOL_HEADER));
  return { protocol: Math.min(speaks, SYNC_PROTOCOL), outcomes: speaks >= 2 ? leaveOutSentContent(request.mutations, outcomes) : outcomes } satisfies PushResponse;
});
