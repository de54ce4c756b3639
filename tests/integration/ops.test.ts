import { execFile } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { DeleteObjectCommand, GetObjectCommand, PutObjectCommand, S3Client, CreateBucketCommand } from '@aws-sdk/client-s3';
import mysql from 'mysql2/promise';
import { afterAll, describe, expect, it } from 'vitest';
import { closeDb, query } from '../support/db';

const run = promisify(execFile);
const tsx = ['node_modules/.bin/tsx', '--conditions=react-server'] as const;
afterAll(closeDb);

/** Row count and checksum of every table: equal fingerprints mean equal data. */
async function fingerprint(conn: mysql.Pool | mysql.Connection, database: string) {
  const [tables] = (await conn.query('SELECT table_name AS t FROM information_schema.tables WHERE table_schema = ? ORDER BY table_name', [database])) as unknown as [{ t: string }[]];
  const out: Record<string, string> = {};
  for (const { t } of tables) {
    const [[sum]] = (await conn.query(`CHECKSUM TABLE \`${database}\`.\`${t}\``)) as unknown as [[{ Checksum: number }]];
    const [[count]] = (await conn.query(`SELECT COUNT(*) AS n FROM \`${database}\`.\`${t}\``)) as unknown as [[{ n: number }]];
    out[t] = `${count.n}:${sum.Checksum}`;
  }
  return out;
}

const databaseUrl = process.env.DATABASE_URL!;
const database = new URL(databaseUrl).pathname.slice(1);

describe('migrations and seed', () => {
  it('running the migrations and the demo seed again changes nothing', async () => {
    const pool = mysql.createPool({ uri: databaseUrl });
    try {
      await query("DELETE FROM rate_limits"); // counters move with every sign-in elsewhere in the suite
      const before = await fingerprint(pool, database);
      expect(Object.keys(before)).toEqual(expect.arrayContaining(['sites', 'users', 'areas', 'audit_log']));
      const migrate = await run(tsx[0], ['db/migrate.ts']);
      expect(migrate.stdout).toContain('migrations applied');
      const seed = await run(tsx[0], [tsx[1], 'db/seed/index.ts']);
      expect(seed.stdout).toContain('0 new demo accounts');
      await query("DELETE FROM rate_limits");
      expect(await fingerprint(pool, database)).toEqual(before);
      const [site] = await query<{ n: number }>("SELECT COUNT(*) AS n FROM sites WHERE code = 'calder-reach'");
      expect(Number(site!.n)).toBe(1);
    } finally {
      await pool.end();
    }
  }, 120_000);
});

describe('backup and restore', () => {
  it('a backup restored into an empty database gives back the same data and the stored files', async () => {
    const s3 = new S3Client({
      region: 'us-east-1',
      endpoint: process.env.S3_ENDPOINT,
      forcePathStyle: true,
      credentials: { accessKeyId: process.env.S3_ACCESS_KEY_ID!, secretAccessKey: process.env.S3_SECRET_ACCESS_KEY! },
      requestChecksumCalculation: 'WHEN_REQUIRED',
      responseChecksumValidation: 'WHEN_REQUIRED',
    });
    const bucket = process.env.S3_BUCKET!;
    await s3.send(new CreateBucketCommand({ Bucket: bucket })).catch(() => undefined);
    const key = `backup-check/${Date.now()}.txt`;
    await s3.send(new PutObjectCommand({ Bucket: bucket, Key: key, Body: 'a stored photo stands in here' }));

    const dir = mkdtempSync(join(tmpdir(), 'rungbook-backup-'));
    const scratch = `${database}_scratch_${Date.now()}`;
    const pool = mysql.createPool({ uri: databaseUrl });
    try {
      await query('DELETE FROM rate_limits');
      const backup = await run(tsx[0], [tsx[1], 'lib/ops/backup.ts', '--out', dir]);
      expect(backup.stdout).toMatch(/[1-9]\d* stored objects/);
      const original = await fingerprint(pool, database);

      await s3.send(new DeleteObjectCommand({ Bucket: bucket, Key: key }));
      await pool.query(`CREATE DATABASE \`${scratch}\``);
      const scratchUrl = new URL(databaseUrl);
      scratchUrl.pathname = `/${scratch}`;
      const refused = await run(tsx[0], [tsx[1], 'lib/ops/restore.ts', '--from', dir], { env: { ...process.env, DATABASE_URL: scratchUrl.toString() } }).catch((e: { code: number; stderr: string }) => e);
      expect((refused as { code: number }).code).toBe(2); // without --yes nothing happens

      const restored = await run(tsx[0], [tsx[1], 'lib/ops/restore.ts', '--from', dir, '--yes'], { env: { ...process.env, DATABASE_URL: scratchUrl.toString() } });
      expect(restored.stdout).toContain('restored database');
      expect(await fingerprint(pool, scratch)).toEqual(original);
      const body = await (await s3.send(new GetObjectCommand({ Bucket: bucket, Key: key }))).Body!.transformToString();
      expect(body).toBe('a stored photo stands in here');
    } finally {
      await pool.query(`DROP DATABASE IF EXISTS \`${scratch}\``);
      await pool.end();
      rmSync(dir, { recursive: true, force: true });
    }
  }, 120_000);
});

describe('creating a site from the command line', () => {
  it('makes the site and an invited first admin, with no demo data, and e-mails the invitation', async () => {
    const code = `plant-${Date.now().toString(36)}`;
    const email = `first.admin.${code}@example.test`;
    const out = await run(tsx[0], [tsx[1], 'lib/ops/create-site.ts', '--code', code, '--name', 'Harbour Salts Plant', '--admin-email', email]);
    expect(out.stdout).toContain('invitation link: ');
    const [site] = await query<{ id: string; name: string }>('SELECT id, name FROM sites WHERE code = ?', [code]);
    expect(site!.name).toBe('Harbour Salts Plant');
    const people = await query<{ email: string; role: string; status: string }>('SELECT email, role, status FROM users WHERE site_id = ?', [site!.id]);
    expect(people).toEqual([{ email, role: 'admin', status: 'invited' }]);
    const areas = await query('SELECT id FROM areas WHERE site_id = ?', [site!.id]);
    expect(areas).toHaveLength(0);
    const inbox = await fetch(`${process.env.MAIL_INBOX_URL}/messages?to=${encodeURIComponent(email)}`).then((r) => r.json() as Promise<{ messages: { text: string }[] }>);
    expect(inbox.messages[0]!.text).toContain('/invitation?token=');
  }, 60_000);

  it('refuses bad arguments naming the flag, and a code that exists, without changing anything', async () => {
    const before = await query<{ n: number }>('SELECT COUNT(*) AS n FROM sites');
    const bad = (await run(tsx[0], [tsx[1], 'lib/ops/create-site.ts', '--code', 'Bad Code', '--name', 'X plant', '--admin-email', 'a@b.test']).catch((e: unknown) => e)) as { code: number; stderr: string };
    expect(bad.code).toBe(2);
    expect(bad.stderr).toContain('--code');
    const taken = (await run(tsx[0], [tsx[1], 'lib/ops/create-site.ts', '--code', 'calder-reach', '--name', 'Again', '--admin-email', `x.${Date.now()}@example.test`]).catch((e: unknown) => e)) as { code: number; stderr: string };
    expect(taken.code).toBe(2);
    expect(taken.stderr).toContain('exists already');
    const after = await query<{ n: number }>('SELECT COUNT(*) AS n FROM sites');
    expect(after[0]!.n).toBe(before[0]!.n);
  }, 60_000);
});
