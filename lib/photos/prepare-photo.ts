// In the browser: check a picked or captured file, then resize and re-compress it to a JPEG before
// it is kept on the device. Client-only (canvas, createImageBitmap, Web Crypto).
import { formatBytes, PHOTO_MAX_BYTES, PHOTO_MAX_EDGE, PHOTO_SOURCE_MAX_BYTES } from './photo-limits';
import { describeBytes, sniffImageType } from './sniff-image-type';

/** A photo the browser refuses; `field` names the form field for the error message. */
export class PhotoPickError extends Error {
  readonly field = 'photo';
  constructor(message: string) {
    super(message);
    this.name = 'PhotoPickError';
  }
}

export interface PreparedPhoto {
  blob: Blob;
  contentType: 'image/jpeg';
  byteSize: number;
  /** Lowercase hex SHA-256 of `blob`: the server checks the upload against it. */
  sha256: string;
  width: number;
  height: number;
}

const JPEG_QUALITY = 0.84;

export async function sha256Hex(blob: Blob): Promise<string> {
  const digest = await crypto.subtle.digest('SHA-256', await blob.arrayBuffer());
  return [...new Uint8Array(digest)].map((b) => b.toString(16).padStart(2, '0')).join('');
}

/**
 * Check the file by its content (JPEG, PNG or WebP), decode it, scale it so its longest edge is at
 * most PHOTO_MAX_EDGE, and encode a JPEG. Re-drawing on a canvas also leaves the camera's EXIF
 * (location included) behind; the server strips metadata again whatever a client sends.
 */
export async function preparePhoto(file: Blob): Promise<PreparedPhoto> {
  if (file.size === 0) throw new PhotoPickError('The file is empty: take the photo again or choose another file.');
  if (file.size > PHOTO_SOURCE_MAX_BYTES) {
    throw new PhotoPickError(`The file is ${formatBytes(file.size)}; a photo may be at most ${formatBytes(PHOTO_SOURCE_MAX_BYTES)} before it is resized.`);
  }
  const head = new Uint8Array(await file.slice(0, 16).arrayBuffer());
  if (!sniffImageType(head)) throw new PhotoPickError(`This is ${describeBytes(head)}, not a photo: choose a JPEG, PNG or WebP image.`);

  let bitmap: ImageBitmap;
  try {
    bitmap = await createImageBitmap(file, { imageOrientation: 'from-image' });
  } catch {
    throw new PhotoPickError('The image is damaged or incomplete and cannot be read: take the photo again or choose another file.');
  }
  try {
    if (bitmap.width < 1 || bitmap.height < 1) throw new PhotoPickError('The image has no pixels.');
    const scale = Math.min(1, PHOTO_MAX_EDGE / Math.max(bitmap.width, bitmap.height));
    const width = Math.max(1, Math.round(bitmap.width * scale));
    const height = Math.max(1, Math.round(bitmap.height * scale));
    const canvas = document.createElement('canvas');
    canvas.width = width;
    canvas.height = height;
    const ctx = canvas.getContext('2d');
    if (!ctx) throw new PhotoPickError('This browser cannot process images (no canvas).');
    ctx.fillStyle = '#ffffff'; // transparent PNG areas become white, not black, in a JPEG
    ctx.fillRect(0, 0, width, height);
    ctx.imageSmoothingQuality = 'high';
    ctx.drawImage(bitmap, 0, 0, width, height);
    const blob = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, 'image/jpeg', JPEG_QUALITY));
    if (!blob) throw new PhotoPickError('The photo could not be compressed on this device.');
    if (blob.size > PHOTO_MAX_BYTES) throw new PhotoPickError(`Even resized the photo is ${formatBytes(blob.size)}; at most ${formatBytes(PHOTO_MAX_BYTES)} can be kept.`);
    return { blob, contentType: 'image/jpeg', byteSize: blob.size, sha256: await sha256Hex(blob), width, height };
  } finally {
    bitmap.close();
  }
}
