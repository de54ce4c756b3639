// GET /api/v1/editions/:editionId/export – the edition as a change-list CSV (UTF-8 with BOM)
import { getEditionOrThrow, getEditionValues } from '@/db/access/editions';
import { editionToCsv } from '@/lib/editions/export-csv';
import { route } from '@/lib/server/route';

export const GET = route({ requires: 'site.read', tokens: true }, async ({ actor, params }) => {
  const edition = await getEditionOrThrow(actor.siteId, String(params.editionId));
  const csv = editionToCsv(await getEditionValues(edition.id));
  return new Response(csv, {
    headers: {
      'Content-Type': 'text/csv; charset=utf-8',
      'Content-Disposition': `attachment; filename="rungbook-edition-${edition.number}.csv"`,
      ETag: edition.etag,
    },
  });
});
