// GET /api/v1/photos/:photoId/image – the photo's bytes for a user of its site (?variant=thumb|full)
//
// Served from our own origin, read from object storage by the server: a tablet needs to reach only
// Rungbook (never the storage endpoint), and the service worker can keep the photos a user has seen
// for offline use. A photo record is append-only, so its bytes never change: the answer may be kept.
// Integrations that want to fetch from storage directly get a signed URL from GET /api/v1/photos/:id.
import { z } from 'zod';
import { getPhotoOrThrow } from '@/db/access/photos';
import { photoKeys } from '@/lib/photos/photo-keys';
import { readPhotoObject } from '@/lib/photos/store-photo';
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
  const image = await readPhotoObject(variant === 'thumb' ? keys.thumbnail : keys.original, photo.id);
  return new Response(image.body, {
    status: 200,
    headers: {
      'Content-Type': image.contentType ?? (variant === 'thumb' ? 'image/jpeg' : photo.meta.contentType),
      ...(image.length !== undefined ? { 'Content-Length': String(image.length) } : {}),
      'Cache-Control': 'private, max-age=31536000, immutable',
      'X-Content-Type-Options': 'nosniff',
    },
  });
});
