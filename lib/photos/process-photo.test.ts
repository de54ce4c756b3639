import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { THUMB_MAX_EDGE } from './photo-limits';
import { PhotoInputError, processPhoto } from './process-photo';

// A JPEG carrying camera EXIF with a GPS position (invented coordinates).
async function jpegWithLocation(width = 800, height = 600) {
  return sharp({ create: { width, height, channels: 3, background: '#5b8a72' } })
    .jpeg()
    .withExif({ IFD0: { Make: 'BenchCam', Model: 'T1' }, IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '53/1 28/1 12/1', GPSLongitudeRef: 'W', GPSLongitude: '2/1 14/1 9/1' } })
    .toBuffer();
}
const GPS_IFD_TAG_LE = Buffer.from([0x25, 0x88]); // tag 0x8825 (GPSInfo) as stored little-endian

describe('processPhoto', () => {
  it('drops EXIF (and with it the location) and keeps the format and size', async () => {
    const input = await jpegWithLocation();
    const before = await sharp(input).metadata();
    expect(before.exif?.includes(GPS_IFD_TAG_LE)).toBe(true);
    const out = await processPhoto(input);
    expect(out.type).toBe('image/jpeg');
    const after = await sharp(out.original).metadata();
    expect(after.format).toBe('jpeg');
    expect(after.exif).toBeUndefined();
    expect(after.xmp).toBeUndefined();
    expect([after.width, after.height]).toEqual([800, 600]);
    expect(out.original.includes(Buffer.from('Exif\0\0', 'latin1'))).toBe(false);
  });

  it('makes a JPEG thumbnail no longer than the thumbnail edge', async () => {
    const png = await sharp({ create: { width: 1200, height: 400, channels: 4, background: '#20304080' } }).png().toBuffer();
    const out = await processPhoto(png);
    expect(out.type).toBe('image/png');
    const thumb = await sharp(out.thumbnail).metadata();
    expect(thumb.format).toBe('jpeg');
    expect(Math.max(thumb.width!, thumb.height!)).toBe(THUMB_MAX_EDGE);
  });

  it('refuses a non-image and a damaged image with a reason', async () => {
    await expect(processPhoto(Buffer.from('GIF89a......'))).rejects.toMatchObject({ kind: 'unsupported_type', message: expect.stringContaining('GIF') });
    const jpeg = await jpegWithLocation();
    const damaged = Buffer.concat([jpeg.subarray(0, 300), Buffer.alloc(400, 0x11)]);
    const error = await processPhoto(damaged).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(PhotoInputError);
    expect((error as PhotoInputError).kind).toBe('corrupt');
    expect((error as Error).message).toMatch(/damaged or incomplete/);
  });
});
