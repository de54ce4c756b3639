// POST /api/v1/conflicts/:conflictId/resolve – settle a conflict or edition drift (supervisors)
import { resolveConflict } from '@/db/access/sync-conflicts';
import { requireUserActor, route } from '@/lib/server/route';
import { resolveConflictSchema } from '@/lib/sync/protocol';

export const POST = route({ requires: 'reconcile.resolve' }, async ({ actor, params, body }) => {
  await requireUserActor(actor);
  const choice = await body(resolveConflictSchema);
  if (actor.kind !== 'user') throw new Error('unreachable');
  const record = await resolveConflict(actor, String(params.conflictId), choice);
  return { record };
});
