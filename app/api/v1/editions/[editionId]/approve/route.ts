// POST /api/v1/editions/:editionId/approve – approve an edition in review: it comes into force, the previous one retires
import { noticeInForce } from '@/db/access/edition-notices';
import { approveEdition, requirePerson } from '@/db/access/edition-workflow';
import { route } from '@/lib/server/route';

export const POST = route({ requires: 'edition.approve' }, async ({ actor, params }) => {
  const person = requirePerson(actor);
  const { edition, retired } = await approveEdition(person, String(params.editionId));
  await noticeInForce(edition, person.displayName, retired?.number ?? null);
  return { edition, retired };
});
