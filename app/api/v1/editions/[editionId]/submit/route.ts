// POST /api/v1/editions/:editionId/submit – send a draft for review (its author); supervisors are told by e-mail
import { noticeSubmitted } from '@/db/access/edition-notices';
import { requirePerson, submitForReview } from '@/db/access/edition-workflow';
import { route } from '@/lib/server/route';

export const POST = route({ requires: 'edition.draft' }, async ({ actor, params }) => {
  const person = requirePerson(actor);
  const edition = await submitForReview(person, String(params.editionId));
  await noticeSubmitted(edition, person.displayName);
  return { edition };
});
