import 'server-only';
import { CreateBucketCommand, HeadBucketCommand, S3Client } from '@aws-sdk/client-s3';
import { env } from '@/lib/env';

const g = globalThis as unknown as { rungbookS3?: S3Client; rungbookBucketReady?: Promise<void> };

/** The S3 client: the local fake on loopback, or a real bucket when S3_ENDPOINT etc. say so. */
export function objectStore(): S3Client {
  g.rungbookS3 ??= new S3Client({
    region: env().S3_REGION,
    endpoint: env().S3_ENDPOINT || undefined,
    forcePathStyle: env().S3_FORCE_PATH_STYLE === 'true',
    credentials: { accessKeyId: env().S3_ACCESS_KEY_ID, secretAccessKey: env().S3_SECRET_ACCESS_KEY },
    // Without these the SDK adds checksum trailers that S3-compatible fakes store as data.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
  return g.rungbookS3;
}

export const bucket = () => env().S3_BUCKET;

/** Create the bucket on first use when it is missing (the local fake starts empty). */
export function ensureBucket(): Promise<void> {
  g.rungbookBucketReady ??= (async () => {
    try {
      await objectStore().send(new HeadBucketCommand({ Bucket: bucket() }));
    } catch {
      await objectStore().send(new CreateBucketCommand({ Bucket: bucket() }));
    }
  })().catch((error: unknown) => {
    g.rungbookBucketReady = undefined;
    throw error;
  });
  return g.rungbookBucketReady;
}
