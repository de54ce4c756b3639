import 'server-only';
import { DeleteObjectsCommand, GetObjectCommand, NoSuchKey, PutObjectCommand } from '@aws-sdk/client-s3';
import { bucket, ensureBucket, objectStore } from '@/lib/storage/object-store';
import { AppError } from '@/lib/server/errors';
import { log } from '@/lib/server/log';
import type { PhotoKeys } from './photo-keys';
import type { ProcessedPhoto } from './process-photo';

export const STORAGE_UNAVAILABLE = 'Photo storage is unavailable right now. The photo stays on the device and is sent again at the next sync.';

/**
 * Put the stripped photo and its thumbnail into object storage. Storage trouble (stopped, refusing,
 * timing out) becomes 503 so devices keep the blob and retry; a half-written pair is removed.
 */
export async function storePhotoObjects(keys: PhotoKeys, photo: ProcessedPhoto, meta: { siteId: string; photoId: string }): Promise<void> {
  const s3 = objectStore();
  try {
    await ensureBucket();
    await s3.send(new PutObjectCommand({ Bucket: bucket(), Key: keys.original, Body: photo.original, ContentType: photo.type, CacheControl: 'private, max-age=86400', Metadata: { site: meta.siteId, photo: meta.photoId } }));
    await s3.send(new PutObjectCommand({ Bucket: bucket(), Key: keys.thumbnail, Body: photo.thumbnail, ContentType: 'image/jpeg', CacheControl: 'private, max-age=86400', Metadata: { site: meta.siteId, photo: meta.photoId } }));
  } catch (error) {
    log.warn({ err: error, photoId: meta.photoId }, 'photo upload: object storage failed');
    await s3.send(new DeleteObjectsCommand({ Bucket: bucket(), Delete: { Objects: [{ Key: keys.original }, { Key: keys.thumbnail }], Quiet: true } })).catch(() => undefined);
    throw new AppError('unavailable', STORAGE_UNAVAILABLE);
  }
}

/**
 * Read one stored image (the photo or its thumbnail) as a stream with its type and length. A missing
 * object where the record says stored is logged and answers 404; storage trouble answers 503.
 */
export async function readPhotoObject(key: string, photoId: string): Promise<{ body: ReadableStream; contentType: string | undefined; length: number | undefined }> {
  try {
    const object = await objectStore().send(new GetObjectCommand({ Bucket: bucket(), Key: key }));
    if (!object.Body) throw new Error('object storage answered without a body');
    return { body: object.Body.transformToWebStream(), contentType: object.ContentType, length: object.ContentLength };
  } catch (error) {
    if (error instanceof NoSuchKey) {
      log.error({ photoId, key }, 'photo image: the record says stored, the object is missing');
      throw new AppError('not_found', 'The stored image of this photo is missing; it has been logged.');
    }
    log.warn({ err: error, photoId }, 'photo image: object storage could not be read');
    throw new AppError('unavailable', 'Photo storage cannot be reached just now; try again shortly.');
  }
}
