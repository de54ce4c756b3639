// POST /api/v1/editions/:editionId/withdraw – take an edition out of review, back to draft (its author)
import { requirePerson, withdrawFromReview } from '@/db/access/edition-workflow';
import { route } from '@/lib/server/route';

export const POST = route({ requires: 'edition.draft' }, async ({ actor, params }) => {
  const edition = await withdrawFromReview(requirePerson(actor), String(params.editionId));
  return { edition };
});
