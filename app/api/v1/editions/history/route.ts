// GET /api/v1/editions/history?species=&phase=&property=&coordination= – one value across the site's editions
import { getValueHistory } from '@/db/access/edition-history';
import { historyQuerySchema } from '@/lib/editions/schemas';
import { route } from '@/lib/server/route';

export const GET = route({ requires: 'site.read', tokens: true }, async ({ actor, query }) => {
  return getValueHistory(actor.siteId, query(historyQuerySchema));
});
