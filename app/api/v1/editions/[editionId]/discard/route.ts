// POST /api/v1/editions/:editionId/discard – give up a draft (its author, or a supervisor); kept as 'discarded'
import { discardDraft, requirePerson } from '@/db/access/edition-workflow';
import { route } from '@/lib/server/route';

export const POST = route({ requires: 'edition.draft' }, async ({ actor, params }) => {
  const edition = await discardDraft(requirePerson(actor), String(params.editionId));
  return { edition };
});
