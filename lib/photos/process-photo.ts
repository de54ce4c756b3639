import 'server-only';
import sharp, { type Metadata } from 'sharp';
import { PHOTO_MAX_PIXELS, THUMB_MAX_EDGE, type PhotoType } from './photo-limits';
import { describeBytes, sniffImageType } from './sniff-image-type';

/** Bad photo input: `status` is the HTTP answer the upload route gives (415 type, 422 corrupt). */
export class PhotoInputError extends Error {
  constructor(
    readonly kind: 'unsupported_type' | 'corrupt' | 'too_many_pixels',
    message: string,
  ) {
    super(message);
    this.name = 'PhotoInputError';
  }
}

export interface ProcessedPhoto {
  type: PhotoType;
  /** The photo re-encoded in its own format with every metadata block dropped (EXIF incl. GPS, XMP, IPTC, ICC comments). */
  original: Buffer;
  /** A JPEG no longer than THUMB_MAX_EDGE on its longest edge. */
  thumbnail: Buffer;
  width: number;
  height: number;
}

/**
 * Check a photo by content and make what is stored: the type must be JPEG, PNG or WebP by its
 * bytes; it must decode completely (a truncated or corrupt file is refused, not half-stored).
 * Re-encoding through libvips without `keepMetadata` drops EXIF (location, camera serials), XMP
 * and IPTC; the EXIF orientation is applied to the pixels first so the photo still stands upright.
 */
export async function processPhoto(bytes: Buffer): Promise<ProcessedPhoto> {
  const type = sniffImageType(bytes.subarray(0, 16));
  if (!type) throw new PhotoInputError('unsupported_type', `This is ${describeBytes(bytes.subarray(0, 16))}, not a photo: send a JPEG, PNG or WebP image.`);
  const input = () => sharp(bytes, { failOn: 'error', limitInputPixels: PHOTO_MAX_PIXELS, sequentialRead: true });
  let meta: Metadata;
  try {
    meta = await input().metadata();
  } catch (error) {
    throw corrupt(error, type);
  }
  if ((meta.width ?? 0) * (meta.height ?? 0) > PHOTO_MAX_PIXELS) {
    throw new PhotoInputError('too_many_pixels', `The image is ${meta.width}×${meta.height} pixels; at most ${PHOTO_MAX_PIXELS / 1_000_000} megapixels are accepted.`);
  }
  try {
    const upright = input().rotate();
    const encoded =
      type === 'image/jpeg'
        ? upright.jpeg({ quality: 88, mozjpeg: true })
        : type === 'image/png'
          ? upright.png({ compressionLevel: 8 })
          : upright.webp({ quality: 88 });
    const { data: original, info } = await encoded.toBuffer({ resolveWithObject: true });
    const thumbnail = await sharp(original, { failOn: 'error' })
      .resize({ width: THUMB_MAX_EDGE, height: THUMB_MAX_EDGE, fit: 'inside', withoutEnlargement: true })
      .flatten({ background: '#ffffff' })
      .jpeg({ quality: 78, mozjpeg: true })
      .toBuffer();
    return { type, original, thumbnail, width: info.width, height: info.height };
  } catch (error) {
    throw corrupt(error, type);
  }
}

function corrupt(error: unknown, type: PhotoType): PhotoInputError {
  const detail = error instanceof Error ? error.message.split('\n')[0]!.replace(/^Input buffer has corrupt header: /, '') : 'unreadable';
  return new PhotoInputError('corrupt', `The ${type.slice(6).toUpperCase()} image is damaged or incomplete and cannot be read (${detail}).`);
}
