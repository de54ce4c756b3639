import 'server-only';
import { drizzle, type MySql2Database } from 'drizzle-orm/mysql2';
import mysql from 'mysql2/promise';
import { env } from '@/lib/env';
import * as schema from './schema';

export type Db = MySql2Database<typeof schema>;

// One pool per process (cached on globalThis so dev reloads don't leak connections).
const g = globalThis as unknown as { rungbookPool?: mysql.Pool; rungbookDb?: Db };

export function pool(): mysql.Pool {
  g.rungbookPool ??= mysql.createPool({
    uri: env().DATABASE_URL,
    connectionLimit: 20,
    timezone: 'Z',
    dateStrings: false,
    supportBigNumbers: true,
    decimalNumbers: false,
    // Prepared statements (the sync writes, db/access/sync-records.ts) kept per connection, LRU:
    // 20 connections × 100 stays far below the server's max_prepared_stmt_count (16,382).
    maxPreparedStatements: 100,
  });
  return g.rungbookPool;
}

export function db(): Db {
  g.rungbookDb ??= drizzle(pool(), { schema, mode: 'default' });
  return g.rungbookDb;
}

export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];
