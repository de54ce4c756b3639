// npm run backup [-- --out <folder>]
// Writes a consistent dump of the database (mariadb-dump --single-transaction) and a copy of
// every object in the photo bucket to backups/<timestamp>/ (or --out), with a manifest.
import { spawn } from 'node:child_process';
import { createWriteStream, mkdirSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { pipeline } from 'node:stream/promises';
import type { Readable } from 'node:stream';
import { parseArgs } from 'node:util';
import { GetObjectCommand, ListObjectsV2Command } from '@aws-sdk/client-s3';
import { env } from '@/lib/env';
import { bucket, objectStore } from '@/lib/storage/object-store';
import { mariadbArgs } from './mariadb-args';

const { values } = parseArgs({ options: { out: { type: 'string' } } });
const out = values.out ?? join('backups', new Date().toISOString().replace(/[:.]/g, '-'));
mkdirSync(join(out, 'objects'), { recursive: true });

const { args, password, database } = mariadbArgs(env().DATABASE_URL);
const dumpFile = join(out, 'database.sql');
await new Promise<void>((resolve, reject) => {
  const child = spawn('mariadb-dump', [...args, '--single-transaction', '--routines', '--triggers', '--hex-blob', '--skip-comments', '--add-drop-table', database], {
    env: { ...process.env, MYSQL_PWD: password },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  child.stdout.pipe(createWriteStream(dumpFile));
  child.on('error', reject);
  child.on('close', (code) => (code === 0 ? resolve() : reject(new Error(`mariadb-dump exited with ${code}`))));
});

let objects = 0;
try {
  let token: string | undefined;
  do {
    const page = await objectStore().send(new ListObjectsV2Command({ Bucket: bucket(), ContinuationToken: token }));
    for (const o of page.Contents ?? []) {
      if (!o.Key) continue;
      const target = join(out, 'objects', o.Key);
      mkdirSync(dirname(target), { recursive: true });
      const body = (await objectStore().send(new GetObjectCommand({ Bucket: bucket(), Key: o.Key }))).Body as Readable;
      await pipeline(body, createWriteStream(target));
      objects++;
    }
    token = page.IsTruncated ? page.NextContinuationToken : undefined;
  } while (token);
} catch (error) {
  const name = (error as { name?: string }).name;
  if (name !== 'NoSuchBucket') throw error; // no photos stored yet
}

writeFileSync(join(out, 'manifest.json'), JSON.stringify({ kind: 'rungbook-backup', version: 1, database, bucket: bucket(), objects, createdAt: new Date().toISOString() }, null, 2));
console.log(`backup written to ${out} (database ${database}, ${objects} stored objects)`);
