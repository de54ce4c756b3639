// Direct database access for integration tests: set up fixtures the API cannot (a second site),
// and look at rows to prove what a request changed. Never used to fake a response.
import mysql from 'mysql2/promise';
import { hash } from '@node-rs/argon2';
import { v7 } from 'uuid';

let pool: mysql.Pool | undefined;
export function testDb(): mysql.Pool {
  const uri = process.env.DATABASE_URL;
  if (!uri) throw new Error('DATABASE_URL is not set: run the tests through `npm test`');
  pool ??= mysql.createPool({ uri, connectionLimit: 5, timezone: 'Z' });
  return pool;
}

export async function query<T = Record<string, unknown>>(sql: string, params: unknown[] = []): Promise<T[]> {
  const [rows] = await testDb().query(sql, params);
  return rows as T[];
}

/**
 * The stored outcomes of the mutations on these records, wherever the server keeps them: an applied
 * mutation that changed its record is its change-log row (cause 'mutation'); every other outcome is
 * a row of sync_mutations. One row per mutation id.
 */
export async function outcomesOf(recordIds: string[]): Promise<{ mutation_id: string; record_id: string; status: string; revision: number | null }[]> {
  return query(
    `SELECT mutation_id, record_id, status, revision FROM sync_mutations WHERE record_id IN (?)
     UNION ALL
     SELECT mutation_id, record_id, 'applied', revision FROM sync_changes WHERE record_id IN (?) AND cause = 'mutation'`,
    [recordIds, recordIds],
  );
}

/** A fresh site with one user per role; e-mails are unique per call. Password: `password`. */
export async function makeSite(label: string, password = 'a-test-password') {
  const siteId = v7();
  const tag = `${label}-${siteId.slice(-8)}`;
  await query('INSERT INTO sites (id, code, name, created_at) VALUES (?, ?, ?, UTC_TIMESTAMP(3))', [siteId, tag, `Test site ${tag}`]);
  const passwordHash = await hash(password);
  const users: Record<'technician' | 'supervisor' | 'supervisor2' | 'admin', { id: string; email: string }> = {} as never;
  for (const role of ['technician', 'supervisor', 'supervisor2', 'admin'] as const) {
    const id = v7();
    const email = `${role}.${tag}@example.test`;
    await query(
      "INSERT INTO users (id, site_id, email, display_name, role, status, password_hash, created_at) VALUES (?, ?, ?, ?, ?, 'active', ?, UTC_TIMESTAMP(3))",
      [id, siteId, email, `${role} of ${tag}`, role === 'supervisor2' ? 'supervisor' : role, passwordHash],
    );
    users[role] = { id, email };
  }
  return { siteId, password, users };
}

export async function closeDb() {
  await pool?.end();
  pool = undefined;
}
