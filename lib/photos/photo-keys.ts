// Where a photo's objects live in the bucket. The site comes first, so a site's photos share one
// prefix (backup copies every object; a site can be exported by prefix). Pure.
import { PHOTO_EXTENSION, type PhotoType } from './photo-limits';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const SAFE = /^[A-Za-z0-9_-]{1,36}$/;

export interface PhotoKeys {
  original: string;
  thumbnail: string;
}

/** Object keys of a stored photo (metadata stripped) and its thumbnail (always JPEG). */
export function photoKeys(siteId: string, photoId: string, type: PhotoType): PhotoKeys {
  // Ids are checked so a crafted id can never escape the site's prefix.
  if (!SAFE.test(siteId)) throw new Error(`unsafe site id for an object key: ${siteId}`);
  if (!UUID.test(photoId)) throw new Error(`a photo id must be a UUID: ${photoId}`);
  const base = `sites/${siteId}/photos/${photoId.toLowerCase()}`;
  return { original: `${base}/photo.${PHOTO_EXTENSION[type]}`, thumbnail: `${base}/thumb.jpg` };
}
