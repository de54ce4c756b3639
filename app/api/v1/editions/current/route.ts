// GET /api/v1/editions/current – the edition in force with its values; ETag, 304 when unchanged
import { editionResponse, matchesEtag } from '@/db/access/edition-payload';
import { getEditionInForce, getEditionInForceEtag } from '@/db/access/editions';
import { AppError } from '@/lib/server/errors';
import { route } from '@/lib/server/route';

export const GET = route({ requires: 'site.read', tokens: true }, async ({ actor, req }) => {
  const started = performance.now();
  // Server-Timing: this handler's own time (after sign-in checks, before compression), for perf/.
  const timed = (res: Response) => {
    res.headers.set('Server-Timing', `edition;dur=${(performance.now() - started).toFixed(2)}`);
    return res;
  };
  // The common case for a device: nothing changed. Answer from the narrow ETag read alone.
  const etag = await getEditionInForceEtag(actor.siteId);
  if (etag && matchesEtag(req.headers.get('if-none-match'), etag)) {
    return timed(new Response(null, { status: 304, headers: { ETag: etag, 'Cache-Control': 'private, no-cache', Vary: 'Accept-Encoding, Cookie' } }));
  }
  const edition = await getEditionInForce(actor.siteId);
  if (!edition) throw new AppError('not_found', 'No reference edition is in force on this site yet.');
  return timed(await editionResponse(req, edition));
});
