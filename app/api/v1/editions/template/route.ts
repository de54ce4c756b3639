// GET /api/v1/editions/template – the change-list CSV template (header and example rows)
import { templateCsv } from '@/lib/editions/export-csv';
import { route } from '@/lib/server/route';

export const GET = route({ requires: 'site.read' }, async () => {
  return new Response(templateCsv(), {
    headers: { 'Content-Type': 'text/csv; charset=utf-8', 'Content-Disposition': 'attachment; filename="rungbook-change-list-template.csv"' },
  });
});
