import {
  bigint,
  index,
  int,
  json,
  mysqlEnum,
  mysqlTable,
  uniqueIndex,
  varchar,
} from 'drizzle-orm/mysql-core';
import { at, id, ref } from './columns';


export const ROLES = ['technician', 'supervisor', 'admin'] as const;
export type Role = (typeof ROLES)[number];
export const USER_STATUSES = ['invited', 'active', 'deactivated'] as const;

export const sites = mysqlTable('sites', {
  id: id(),
  code: varchar('code', { length: 40 }).notNull().unique(),
  name: varchar('name', { length: 120 }).notNull(),
  createdAt: at('created_at').notNull(),
});

export const areas = mysqlTable(
  'areas',
  {
    id: id(),
    siteId: ref('site_id').notNull().references(() => sites.id),
    name: varchar('name', { length: 120 }).notNull(),
    createdAt: at('created_at').notNull(),
  },
  (t) => [uniqueIndex('areas_site_name').on(t.siteId, t.name)],
);

export const users = mysqlTable(
  'users',
  {
    id: id(),
    siteId: ref('site_id').notNull().references(() => sites.id),
    email: varchar('email', { length: 254 }).notNull().unique(),
    displayName: varchar('display_name', { length: 120 }).notNull(),
    role: mysqlEnum('role', ROLES).notNull(),
    status: mysqlEnum('status', USER_STATUSES).notNull(),
    passwordHash: varchar('password_hash', { length: 255 }),
    // Bumped on deactivation, role change or "sign out everywhere": older sessions stop working.
    sessionVersion: int('session_version').notNull().default(1),
    preferredUnit: mysqlEnum('preferred_unit', ['kJ/mol', 'kcal/mol', 'eV']).notNull().default('kJ/mol'),
    createdAt: at('created_at').notNull(),
    lastSignInAt: at('last_sign_in_at'),
  },
  (t) => [index('users_site').on(t.siteId)],
);

export const apiTokens = mysqlTable(
  'api_tokens',
  {
    id: id(),
    siteId: ref('site_id').notNull().references(() => sites.id),
    name: varchar('name', { length: 120 }).notNull(),
    // SHA-256 of the secret; the secret itself is shown once and never stored.
    tokenHash: varchar('token_hash', { length: 64 }).notNull().unique(),
    prefix: varchar('prefix', { length: 16 }).notNull(),
    role: mysqlEnum('role', ['technician', 'supervisor']).notNull(),
    createdBy: ref('created_by').notNull().references(() => users.id),
    createdAt: at('created_at').notNull(),
    lastUsedAt: at('last_used_at'),
    revokedAt: at('revoked_at'),
  },
  (t) => [index('api_tokens_site').on(t.siteId)],
);

/** One-time links: e-mail sign-in and invitations. Only the SHA-256 of the secret is stored. */
export const oneTimeLinks = mysqlTable(
  'one_time_links',
  {
    id: id(),
    userId: ref('user_id').notNull().references(() => users.id),
    purpose: mysqlEnum('purpose', ['sign_in', 'invitation']).notNull(),
    tokenHash: varchar('token_hash', { length: 64 }).notNull().unique(),
    expiresAt: at('expires_at').notNull(),
    usedAt: at('used_at'),
    createdAt: at('created_at').notNull(),
  },
  (t) => [index('one_time_links_user').on(t.userId)],
);

/** Fixed-window counters, kept in the database so limits hold across app servers. */
export const rateLimits = mysqlTable('rate_limits', {
  key: varchar('bucket_key', { length: 191 }).primaryKey(),
  hits: int('hits').notNull(),
  windowEndsAt: at('window_ends_at').notNull(),
});

export const auditLog = mysqlTable(
  'audit_log',
  {
    id: bigint('id', { mode: 'number', unsigned: true }).autoincrement().primaryKey(),
    siteId: ref('site_id').notNull(),
    actorUserId: ref('actor_user_id'),
    actorTokenId: ref('actor_token_id'),
    action: varchar('action', { length: 80 }).notNull(),
    entityType: varchar('entity_type', { length: 40 }).notNull(),
    entityId: varchar('entity_id', { length: 64 }).notNull(),
    before: json('before'),
    after: json('after'),
    at: at('at').notNull(),
  },
  (t) => [index('audit_site_at').on(t.siteId, t.at), index('audit_entity').on(t.entityType, t.entityId)],
);
