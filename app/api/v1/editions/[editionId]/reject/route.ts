// POST /api/v1/editions/:editionId/reject – send an edition in review back to draft, with the reason (the author is e-mailed)
import { noticeRejected } from '@/db/access/edition-notices';
import { rejectEdition, requirePerson } from '@/db/access/edition-workflow';
import { rejectSchema } from '@/lib/editions/schemas';
import { route } from '@/lib/server/route';

export const POST = route({ requires: 'edition.approve' }, async ({ actor, params, body }) => {
  const person = requirePerson(actor);
  const { reason } = await body(rejectSchema);
  const edition = await rejectEdition(person, String(params.editionId), reason);
  await noticeRejected(edition, person.displayName);
  return { edition };
});
