// PUT /api/v1/photos/:photoId – store the bytes of a photo taken at the bench; GET – its short-lived signed URLs
import { createHash } from 'node:crypto';
import { NextResponse } from 'next/server';
import { getPhotoOrThrow, markPhotoStored } from '@/db/access/photos';
import { recordIdSchema } from '@/lib/sheets/sheet-schema';
import { photoKeys } from '@/lib/photos/photo-keys';
import { PHOTO_MAX_BYTES } from '@/lib/photos/photo-limits';
import { PhotoInputError, processPhoto } from '@/lib/photos/process-photo';
import { readUploadBody } from '@/lib/photos/read-upload-body';
import { signPhotoUrl } from '@/lib/photos/sign-photo-url';
import { describeBytes, sniffImageType } from '@/lib/photos/sniff-image-type';
import { storePhotoObjects } from '@/lib/photos/store-photo';
import { db } from '@/db/client';
import { audit } from '@/lib/server/audit';
import { AppError } from '@/lib/server/errors';
import { requireUserActor, route } from '@/lib/server/route';

export const runtime = 'nodejs';

function photoIdOf(params: Record<string, string | string[] | undefined>): string {
  const parsed = recordIdSchema.safeParse(params.photoId);
  if (!parsed.success) throw new AppError('not_found', 'No such photo on this site (a photo id is a UUID).');
  return parsed.data.toLowerCase();
}

const bad = (code: 'unsupported_media_type' | 'validation', message: string) => new AppError(code, message, { fields: [{ field: 'photo', message }] });

export const PUT = route({ requires: 'sheet.write', anyContentType: true }, async ({ actor, req, params }) => {
  await requireUserActor(actor);
  const photoId = photoIdOf(params);
  // The photo's record syncs first (it is tiny); its bytes follow and must match it.
  const photo = await getPhotoOrThrow(actor.siteId, photoId);
  if (actor.kind !== 'user' || photo.authorId !== actor.userId) throw new AppError('forbidden', "A photo's bytes are uploaded by the person who took it, from their device.");
  if (photo.blobStoredAt) return { id: photoId, stored: true, alreadyStored: true };

  const bytes = await readUploadBody(req, PHOTO_MAX_BYTES);
  const head = bytes.subarray(0, 16);
  const type = sniffImageType(head);
  if (!type) throw bad('unsupported_media_type', `This is ${describeBytes(head)}, not a photo: a bench photo must be a JPEG, PNG or WebP image.`);
  if (type !== photo.meta.contentType) throw bad('validation', `The bytes are a ${type} image but the photo's record says ${photo.meta.contentType}.`);
  const sha256 = createHash('sha256').update(bytes).digest('hex');
  if (sha256 !== photo.meta.sha256 || bytes.length !== photo.meta.byteSize) {
    throw bad('validation', "These bytes are not the photo its record describes (size or SHA-256 differ); the device's copy is kept and sent again.");
  }

  let processed;
  try {
    processed = await processPhoto(bytes);
  } catch (error) {
    if (error instanceof PhotoInputError) throw bad(error.kind === 'unsupported_type' ? 'unsupported_media_type' : 'validation', error.message);
    throw error;
  }
  const keys = photoKeys(actor.siteId, photoId, type);
  await storePhotoObjects(keys, processed, { siteId: actor.siteId, photoId });
  const first = await markPhotoStored(actor.siteId, photoId);
  if (first) await audit(db(), actor, { action: 'photo.stored', entityType: 'photo', entityId: photoId, after: { type, width: processed.width, height: processed.height, storedBytes: processed.original.length } });
  return NextResponse.json({ id: photoId, stored: true, alreadyStored: !first, width: processed.width, height: processed.height }, { status: first ? 201 : 200 });
});

export const GET = route({ requires: 'site.read', tokens: true }, async ({ actor, params }) => {
  const photoId = photoIdOf(params);
  const photo = await getPhotoOrThrow(actor.siteId, photoId);
  const base = { id: photoId, benchEntryId: photo.meta.benchEntryId, contentType: photo.meta.contentType, caption: photo.meta.caption, takenAt: photo.meta.takenAt, stored: photo.blobStoredAt !== null };
  if (!photo.blobStoredAt) return base;
  const keys = photoKeys(actor.siteId, photoId, photo.meta.contentType);
  const [full, thumb] = await Promise.all([signPhotoUrl(keys.original), signPhotoUrl(keys.thumbnail)]);
  return NextResponse.json({ ...base, url: full.url, thumbnailUrl: thumb.url, expiresAt: full.expiresAt }, { headers: { 'Cache-Control': 'private, no-store' } });
});
