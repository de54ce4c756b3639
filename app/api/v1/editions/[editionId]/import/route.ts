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
  const bytes = await readCapped(req.body, LIMITS.maxBytes);
  const decoded = decodeUtf8(bytes);
  if (!decoded.ok) throw rowErrors(decoded.errors, 'file');
  const parsed = parseChangeCsv(decoded.text);
  if (!parsed.ok) throw rowErrors(parsed.errors, 'file');
  const { plan, edition } = await applyChanges(person, String(params.editionId), parsed.rows, { apply: mode === 'apply', origin: 'import' });
  if (!plan.ok) throw rowErrors(plan.errors, 'file');
  return { applied: mode === 'apply', edition, counts: plan.counts, changes: plan.changes };
});

/**
 * Read the body, keeping at most `max` bytes (a chunked upload has no Content-Length). Past the
 * limit the rest is read and dropped, so the connection stays usable for the 413 answer; a body
 * four times the limit is cut off.
 */
async function readCapped(body: ReadableStream<Uint8Array> | null, max: number): Promise<Uint8Array> {
  if (!body) return new Uint8Array();
  const reader = body.getReader();
  const parts: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > 4 * max) {
      await reader.cancel();
      break;
    }
    if (size <= max) parts.push(value);
  }
  if (size > max) throw new AppError('payload_too_large', `The file is larger than ${max / 1024 / 1024} MiB; split it into smaller change lists.`);
  const out = new Uint8Array(size);
  let at = 0;
  for (const p of parts) {
    out.set(p, at);
    at += p.byteLength;
  }
  return out;
}
