// GET /api/v1/editions/current – the edition in force with its values; ETag, 304 when unchanged
import { editionResponse } from '@/db/access/edition-payload';
import { getEditionInForce } from '@/db/access/editions';
import { AppError } from '@/lib/server/errors';
import { route } from '@/lib/server/route';

export const GET = route({ requires: 'site.read', tokens: true }, async ({ actor, req }) => {
  const edition = await getEditionInForce(actor.siteId);
  if (!edition) throw new AppError('not_found', 'No reference edition is in force on this site yet.');
  return editionResponse(req, edition);
});
