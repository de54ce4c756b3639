import 'server-only';
import { AppError } from '@/lib/server/errors';
import { formatBytes } from './photo-limits';

/**
 * Read a request body up to `limit` bytes. A declared or actual size over the limit is refused with
 * 413 as soon as it is known, without buffering the rest.
 */
export async function readUploadBody(req: Request, limit: number): Promise<Buffer> {
  const tooLarge = (size?: number) =>
    new AppError('payload_too_large', `${size ? `This photo is ${size} bytes` : 'This photo is over the limit'}; a photo may be at most ${formatBytes(limit)} (${limit} bytes).`, {
      fields: [{ field: 'photo', message: `At most ${formatBytes(limit)}` }],
      limit,
    });
  const declared = Number(req.headers.get('content-length') ?? NaN);
  if (Number.isFinite(declared) && declared > limit) throw tooLarge(declared);
  if (!req.body) return Buffer.alloc(0);
  const chunks: Uint8Array[] = [];
  let total = 0;
  const reader = req.body.getReader();
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > limit) {
      await reader.cancel().catch(() => undefined);
      throw tooLarge();
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks);
}
