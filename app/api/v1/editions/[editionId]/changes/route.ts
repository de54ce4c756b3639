// POST /api/v1/editions/:editionId/changes – set or remove values in a draft (the draft editor)
import { applyChanges, requirePerson } from '@/db/access/edition-workflow';
import type { ParsedRow, RowError } from '@/lib/editions/parse-change-csv';
import { validateChangeRow } from '@/lib/editions/parse-change-csv';
import { applyChangesSchema } from '@/lib/editions/schemas';
import { rowErrors } from '@/lib/editions/row-errors';
import { route } from '@/lib/server/route';

export const POST = route({ requires: 'edition.draft' }, async ({ actor, params, body }) => {
  const person = requirePerson(actor);
  const input = await body(applyChangesSchema);
  const rows: ParsedRow[] = [];
  const errors: RowError[] = [];
  input.changes.forEach((fields, i) => {
    const r = validateChangeRow(fields);
    if (r.ok) rows.push({ row: i + 1, change: r.change });
    else for (const e of r.errors) errors.push({ row: i + 1, ...e });
  });
  if (errors.length) throw rowErrors(errors, 'change');
  const { plan, edition } = await applyChanges(person, String(params.editionId), rows, { apply: true, origin: 'editor', revision: input.revision });
  if (!plan.ok) throw rowErrors(plan.errors, 'change');
  return { edition, counts: plan.counts, changes: plan.changes };
});
