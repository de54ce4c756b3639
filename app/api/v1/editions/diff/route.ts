// GET /api/v1/editions/diff?from=&to= – the difference between two editions of the site
import { getEditionOrThrow, getEditionValues } from '@/db/access/editions';
import { diffEditions } from '@/lib/editions/diff-editions';
import { diffQuerySchema } from '@/lib/editions/schemas';
import { route } from '@/lib/server/route';

export const GET = route({ requires: 'site.read', tokens: true }, async ({ actor, query }) => {
  const q = query(diffQuerySchema);
  const from = await getEditionOrThrow(actor.siteId, q.from);
  const to = await getEditionOrThrow(actor.siteId, q.to);
  const diff = diffEditions(await getEditionValues(from.id), await getEditionValues(to.id));
  return { from, to, diff };
});
