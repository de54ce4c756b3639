import 'server-only';
import { GetObjectCommand } from '@aws-sdk/client-s3';
import { getSignedUrl } from '@aws-sdk/s3-request-presigner';
import { bucket, objectStore } from '@/lib/storage/object-store';
import { SIGNED_URL_SECONDS } from './photo-limits';

/**
 * A short-lived signed GET URL for one object. The signing time is rounded down to a window so the
 * same photo gets the same URL for a while (the browser can reuse what it downloaded); every URL
 * is still valid for at least SIGNED_URL_SECONDS − window and at most SIGNED_URL_SECONDS.
 */
export async function signPhotoUrl(key: string, now = Date.now()): Promise<{ url: string; expiresAt: string }> {
  const windowMs = 60_000;
  const signingDate = new Date(Math.floor(now / windowMs) * windowMs);
  const url = await getSignedUrl(objectStore(), new GetObjectCommand({ Bucket: bucket(), Key: key }), { expiresIn: SIGNED_URL_SECONDS, signingDate });
  return { url, expiresAt: new Date(signingDate.getTime() + SIGNED_URL_SECONDS * 1000).toISOString() };
}
