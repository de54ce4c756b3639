// POST /api/v1/sync/push – accept a batch of device changes
import { applyPush } from '@/db/access/sync-push';
import { maybeSendConflictDigest } from '@/db/access/sync-digest';
import { requireSyncUser } from '@/db/access/sync-guard';
import { route } from '@/lib/server/route';
import { leaveOutSentContent, pushRequestSchema, type PushResponse } from '@/lib/sync/protocol';

export const POST = route({ requires: 'sheet.write' }, async ({ req, actor, body }) => {
  const { user, protocol } = requireSyncUser(req, actor);
  const request = await body(pushRequestSchema);
  const outcomes = await applyPush(user, request);
  await maybeSendConflictDigest(user.siteId);
  // Answered in the version the device speaks; from 2, no record content sent back that it sent.
  return { protocol, outcomes: protocol >= 2 ? leaveOutSentContent(request.mutations, outcomes) : outcomes } satisfies PushResponse;
});
