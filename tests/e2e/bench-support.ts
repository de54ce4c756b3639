// Helpers for the bench-log tests (tests/e2e/bench*.spec.ts and tests/integration/photos*.test.ts):
// look into the S3-compatible store the app writes to, and stop and restart the local fakes.
//
// Stopping storage: `npm test` starts lib/ops/fakes.ts (SMTP capture + S3 fake, one process group)
// and writes its pid to .data/fakes-test[-<slot>].pid. `stopFakes()` kills that group (SIGKILL, so
// the app's kept-alive connections to the store break as in a crash); `startFakes()` starts the same
// script again with the same ports and state folder (stored objects survive) and writes the new pid
// to the same file, so test.sh's cleanup still stops it. Mail capture is down for those seconds
// too; tests of one slot run one at a time, so no other test is affected.
import { spawn } from 'node:child_process';
import { openSync, readFileSync, writeFileSync } from 'node:fs';
import { connect } from 'node:net';
import { join } from 'node:path';
import { GetObjectCommand, ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';

const ROOT = process.cwd();
const SLOT = process.env.RUNGBOOK_TEST_SLOT ?? '0';
const FAKES = join(ROOT, '.data', SLOT === '0' ? 'fakes-test' : `fakes-test-${SLOT}`);
const S3_ENDPOINT = process.env.S3_ENDPOINT ?? 'http://127.0.0.1:4669';
export const S3_BUCKET = process.env.S3_BUCKET ?? 'rungbook-test';
const port = (url: string | undefined, fallback: number) => (url ? Number(new URL(url).port) : fallback);

let client: S3Client | undefined;
export function testS3(): S3Client {
  client ??= new S3Client({
    region: 'us-east-1',
    endpoint: S3_ENDPOINT,
    forcePathStyle: true,
    credentials: { accessKeyId: process.env.S3_ACCESS_KEY_ID ?? 'S3RVER', secretAccessKey: process.env.S3_SECRET_ACCESS_KEY ?? 'S3RVER' },
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
  return client;
}

/** Keys of every stored object whose key contains `part` (e.g. a photo id). */
export async function storedKeys(part: string): Promise<string[]> {
  const out: string[] = [];
  let token: string | undefined;
  do {
    const page = await testS3().send(new ListObjectsV2Command({ Bucket: S3_BUCKET, Prefix: 'sites/', ContinuationToken: token }));
    for (const o of page.Contents ?? []) if (o.Key?.includes(part)) out.push(o.Key);
    token = page.IsTruncated ? page.NextContinuationToken : undefined;
  } while (token);
  return out.sort();
}

export async function storedObject(key: string): Promise<Buffer> {
  const res = await testS3().send(new GetObjectCommand({ Bucket: S3_BUCKET, Key: key }));
  return Buffer.from(await res.Body!.transformToByteArray());
}

const listening = (p: number) =>
  new Promise<boolean>((resolve) => {
    const s = connect(p, '127.0.0.1');
    s.once('connect', () => (s.destroy(), resolve(true)));
    s.once('error', () => resolve(false));
  });

async function until(check: () => Promise<boolean>, what: string, ms = 20_000) {
  const end = Date.now() + ms;
  while (Date.now() < end) {
    if (await check()) return;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`timed out waiting for ${what}`);
}

const s3Port = () => port(S3_ENDPOINT, 4669);

/** Stop the local S3 fake (and the mail capture that shares its process). */
export async function stopFakes(): Promise<void> {
  const pid = Number(readFileSync(`${FAKES}.pid`, 'utf8').trim());
  if (!Number.isInteger(pid) || pid <= 1) throw new Error(`no fakes pid in ${FAKES}.pid`);
  try {
    process.kill(-pid, 'SIGKILL');
  } catch {
    /* already gone */
  }
  await until(async () => !(await listening(s3Port())), 'the S3 fake to stop');
}

/** Start the fakes again on the same ports and state folder. */
export async function startFakes(): Promise<void> {
  const log = openSync(`${FAKES}.log`, 'a');
  const child = spawn(join(ROOT, 'node_modules/.bin/tsx'), ['lib/ops/fakes.ts'], {
    cwd: ROOT,
    detached: true, // its own process group, like test.sh's setsid
    stdio: ['ignore', log, log],
    env: {
      ...process.env,
      FAKES_STATE: FAKES,
      FAKES_SMTP_PORT: String(port(process.env.SMTP_URL, 2625)),
      FAKES_MAIL_WEB_PORT: String(port(process.env.MAIL_INBOX_URL, 2680)),
      FAKES_S3_PORT: String(s3Port()),
    },
  });
  child.unref();
  writeFileSync(`${FAKES}.pid`, String(child.pid));
  await until(() => listening(s3Port()), 'the S3 fake to start', 30_000);
}
