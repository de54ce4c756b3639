import { defineConfig } from 'drizzle-kit';

export default defineConfig({
  dialect: 'mysql',
  schema: './db/schema/*.ts',
  out: './drizzle',
  // Only `generate` is used (drizzle-kit push/migrate misbehave on MariaDB); see db/migrate.ts.
  dbCredentials: { url: process.env.DATABASE_URL ?? 'mysql://localhost/rungbook' },
});
