// GET /api/v1/photos/:photoId/image – send a user of the photo's site to a short-lived signed URL (?variant=thumb|full)
import { NextResponse } from 'next/server';
import { z } from 'zod';
import { getPhotoOrThrow } from '@/db/access/photos';
import { photoKeys } from '@/lib/photos/photo-keys';
import { signPhotoUrl } from '@/lib/photos/sign-photo-url';
import { recordIdSchema } from '@/lib/sheets/sheet-schema';
import { AppError } from '@/lib/server/errors';
import { route } from '@/lib/server/route';

export const runtime = 'nodejs';

const querySchema = z.object({ variant: z.enum(['thumb', 'full']).default('thumb') });

export const GET = route({ requires: 'site.read' }, async ({ actor, params, query }) => {
  const { variant } = query(querySchema);
  const id = recordIdSchema.safeParse(params.photoId);
  if (!id.success) throw new AppError('not_found', 'No such photo on this site.');
  const photo = await getPhotoOrThrow(actor.siteId, id.data.toLowerCase());
  if (!photo.blobStoredAt) throw new AppError('not_found', 'This photo has not been uploaded yet: it arrives when the device that took it syncs.', { waiting: true });
  const keys = photoKeys(actor.siteId, photo.id, photo.meta.contentType);
  const { url } = await signPhotoUrl(variant === 'thumb' ? keys.thumbnail : keys.original);
  // The signed URL itself is short-lived; the redirect may be reused briefly by this browser only.
  return NextResponse.redirect(url, { status: 302, headers: { 'Cache-Control': 'private, max-age=30' } });
});
