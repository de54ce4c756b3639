// npm run restore -- --from <backup folder> --yes
// Replaces the database's tables with the dump and puts every stored object back in the bucket.
import { spawn } from 'node:child_process';
import { createReadStream, existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { parseArgs } from 'node:util';
import { PutObjectCommand } from '@aws-sdk/client-s3';
import { env } from '@/lib/env';
import { bucket, ensureBucket, objectStore } from '@/lib/storage/object-store';
import { mariadbArgs } from './mariadb-args';

const { values } = parseArgs({ options: { from: { type: 'string' }, yes: { type: 'boolean' } } });
const from = values.from;
if (!from || !existsSync(join(from, 'manifest.json'))) {
  console.error('restore: --from must name a backup folder (with manifest.json) made by `npm run backup`');
  process.exit(2);
}
const manifest = JSON.parse(readFileSync(join(from, 'manifest.json'), 'utf8')) as { kind?: string; objects?: number };
if (manifest.kind !== 'rungbook-backup') {
  console.error('restore: that folder is not a Rungbook backup');
  process.exit(2);
}
const { args, password, database } = mariadbArgs(env().DATABASE_URL);
if (!values.yes) {
  console.error(`restore: this replaces every table of database "${database}". Run again with --yes to go ahead.`);
  process.exit(2);
}

await new Promise<void>((resolve, reject) => {
  const child = spawn('mariadb', [...args, database], { env: { ...process.env, MYSQL_PWD: password }, stdio: ['pipe', 'inherit', 'inherit'] });
  createReadStream(join(from, 'database.sql')).pipe(child.stdin);
  child.on('error', reject);
  child.on('close', (code) => (code === 0 ? resolve() : reject(new Error(`mariadb exited with ${code}`))));
});

const root = join(from, 'objects');
const files = existsSync(root) ? walk(root) : [];
if (files.length) await ensureBucket();
for (const file of files) {
  await objectStore().send(new PutObjectCommand({ Bucket: bucket(), Key: relative(root, file).split('\\').join('/'), Body: readFileSync(file) }));
}
console.log(`restored database ${database} and ${files.length} stored objects from ${from}`);

function walk(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = join(dir, name);
    return statSync(p).isDirectory() ? walk(p) : [p];
  });
}
