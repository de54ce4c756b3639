// GET /api/v1/conflicts – the site's reconcile queue (filter by status, kind, entity, author, age)
import { conflictListQuerySchema, listConflicts } from '@/db/access/sync-conflicts';
import { route } from '@/lib/server/route';

export const GET = route({ requires: 'reconcile.resolve' }, async ({ actor, query }) => ({ conflicts: await listConflicts(actor.siteId, query(conflictListQuerySchema)) }));
