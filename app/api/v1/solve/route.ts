// POST /api/v1/solve – solve a cycle, dissolution, reaction or calorimetry problem (stateless)
import { z } from 'zod';
import { getEditionInForce, getEditionOrThrow, getEditionValues } from '@/db/access/editions';
import { AppError, fromZodError } from '@/lib/server/errors';
import { route } from '@/lib/server/route';
import { isThermoInputError, lookupFromReferenceValues, solve, solveRequestSchema } from '@/lib/thermo';

/** Where missing cycle values come from: nowhere (all explicit), the edition in force, or a named edition. */
const sourceSchema = z.object({
  referenceEdition: z.union([z.literal('in_force'), z.uuid('referenceEdition must be "in_force" or an edition id')]).optional(),
});

export const POST = route({ requires: 'site.read', tokens: true }, async ({ actor, body }) => {
  const raw = await body(z.unknown());
  const source = sourceSchema.safeParse(raw);
  if (!source.success) throw fromZodError(source.error);
  const request = solveRequestSchema.safeParse(raw);
  if (!request.success) throw fromZodError(request.error);

  let edition: { id: string; number: number } | null = null;
  let lookup;
  if (source.data.referenceEdition) {
    const row =
      source.data.referenceEdition === 'in_force'
        ? await getEditionInForce(actor.siteId)
        : await getEditionOrThrow(actor.siteId, source.data.referenceEdition);
    if (!row) throw new AppError('conflict', 'This site has no reference edition in force yet.', { fields: [{ field: 'referenceEdition', message: 'No edition in force' }] });
    edition = { id: row.id, number: row.number };
    lookup = lookupFromReferenceValues(await getEditionValues(row.id));
  }

  try {
    return { edition, ...solve(request.data, { lookup }) };
  } catch (error) {
    if (isThermoInputError(error)) {
      throw new AppError('validation', error.message, { fields: [{ field: error.field, message: error.message }], reason: error.code, names: error.details });
    }
    throw error;
  }
});
