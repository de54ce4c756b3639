// Applies the SQL migrations in drizzle/ and prints the real error on failure.
import { drizzle } from 'drizzle-orm/mysql2';
import { migrate } from 'drizzle-orm/mysql2/migrator';
import mysql from 'mysql2/promise';

const url = process.env.DATABASE_URL;
if (!url) {
  console.error('DATABASE_URL is not set');
  process.exit(1);
}
const connection = await mysql.createConnection({ uri: url, multipleStatements: true });
try {
  await migrate(drizzle(connection), { migrationsFolder: new URL('../drizzle', import.meta.url).pathname });
  console.log('migrations applied');
} catch (error) {
  const e = error as { message?: string; cause?: { message?: string; sql?: string } };
  console.error('migration failed:', e.cause?.message ?? e.message);
  if (e.cause?.sql) console.error(e.cause.sql);
  process.exitCode = 1;
} finally {
  await connection.end();
}
