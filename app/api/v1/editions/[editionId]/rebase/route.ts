// POST /api/v1/editions/:editionId/rebase – carry a draft's changes onto the edition now in force
import { rebaseEdition, requirePerson } from '@/db/access/edition-workflow';
import { route } from '@/lib/server/route';

export const POST = route({ requires: 'edition.draft' }, async ({ actor, params }) => {
  return rebaseEdition(requirePerson(actor), String(params.editionId));
});
