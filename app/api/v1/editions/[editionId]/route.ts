// GET|PATCH /api/v1/editions/:editionId – one edition with its values (any state); edit a draft's change summary
import { editionResponse } from '@/db/access/edition-payload';
import { getEditionOrThrow, peopleNames } from '@/db/access/editions';
import { requirePerson, updateDraftSummary } from '@/db/access/edition-workflow';
import { updateDraftSchema } from '@/lib/editions/schemas';
import { route } from '@/lib/server/route';

export const GET = route({ requires: 'site.read', tokens: true }, async ({ actor, params, req }) => {
  const edition = await getEditionOrThrow(actor.siteId, String(params.editionId));
  return editionResponse(req, edition);
});

export const PATCH = route({ requires: 'edition.draft' }, async ({ actor, params, body }) => {
  const input = await body(updateDraftSchema);
  const edition = await updateDraftSummary(requirePerson(actor), String(params.editionId), input.changeSummary);
  return { edition, people: await peopleNames(actor.siteId, [edition]) };
});
