import { datetime, varchar } from 'drizzle-orm/mysql-core';

// Column helpers shared by every schema file. Ids are app-made UUIDv7 strings (no reliance on
// auto-increment order across Galera nodes); times are UTC with millisecond precision.
export const id = () => varchar('id', { length: 36 }).primaryKey();
export const ref = (name: string) => varchar(name, { length: 36 });
export const at = (name: string) => datetime(name, { mode: 'date', fsp: 3 });
