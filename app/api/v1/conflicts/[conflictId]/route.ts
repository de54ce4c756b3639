// GET /api/v1/conflicts/:conflictId – both versions, field-level differences and drift details
import { getConflictOrThrow } from '@/db/access/sync-conflicts';
import { route } from '@/lib/server/route';

export const GET = route({ requires: 'reconcile.resolve' }, async ({ actor, params }) => getConflictOrThrow(actor.siteId, String(params.conflictId)));
