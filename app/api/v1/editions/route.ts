// GET|POST /api/v1/editions – list the site's editions with their states; start a new draft
import { listEditions, peopleNames } from '@/db/access/editions';
import { createDraft, requirePerson } from '@/db/access/edition-workflow';
import { createDraftSchema } from '@/lib/editions/schemas';
import { route } from '@/lib/server/route';

export const GET = route({ requires: 'site.read', tokens: true }, async ({ actor }) => {
  const editions = await listEditions(actor.siteId);
  return { editions, people: await peopleNames(actor.siteId, editions) };
});

export const POST = route({ requires: 'edition.draft' }, async ({ actor, body }) => {
  const person = requirePerson(actor);
  const input = await body(createDraftSchema);
  const edition = await createDraft(person, input.changeSummary);
  return Response.json({ edition }, { status: 201 });
});
