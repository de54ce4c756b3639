// POST /api/v1/editions/:editionId/import?mode=preview|apply – a change-list CSV into a draft (all rows or none)
import { z } from 'zod';
import { applyChanges, requirePerson } from '@/db/access/edition-workflow';
import { decodeUtf8, parseChangeCsv } from '@/lib/editions/parse-change-csv';
import { rowErrors } from '@/lib/editions/row-errors';
import { LIMITS } from '@/lib/editions/schemas';
import { AppError } from '@/lib/server/errors';
import { route } from '@/lib/server/route';

const importQuery = z.object({ mode: z.enum(['preview', 'apply'], { message: 'mode must be preview or apply' }).default('preview') });

export const POST = route({ requires: 'edition.draft', anyContentType: true }, async ({ actor, params, query, req }) => {
  const person = requirePerson(actor);
  const { mode } = query(importQuery);
  const declared = Number(req.headers.get('content-length') ?? '0');
  if (declared > LIMITS.maxBytes) throw new AppError('payload_too_large', `The file is larger than ${LIMITS.maxBytes / 1024 / 1024} MiB; split it into smaller change lists.`);
  const bytes = new Uint8Array(await req.arrayBuffer());
  if (bytes.byteLength > LIMITS.maxBytes) throw new AppError('payload_too_large', `The file is larger than ${LIMITS.maxBytes / 1024 / 1024} MiB; split it into smaller change lists.`);
  const decoded = decodeUtf8(bytes);
  if (!decoded.ok) throw rowErrors(decoded.errors, 'file');
  const parsed = parseChangeCsv(decoded.text);
  if (!parsed.ok) throw rowErrors(parsed.errors, 'file');
  const { plan, edition } = await applyChanges(person, String(params.editionId), parsed.rows, { apply: mode === 'apply', origin: 'import' });
  if (!plan.ok) throw rowErrors(plan.errors, 'file');
  return { applied: mode === 'apply', edition, counts: plan.counts, changes: plan.changes };
});
