import {
  boolean,
  index,
  int,
  json,
  mysqlEnum,
  mysqlTable,
  text,
  tinyint,
  uniqueIndex,
  varchar,
} from 'drizzle-orm/mysql-core';
import { at, id, ref } from './columns';
import { sites, users } from './foundation';

// Reference editions (design.md §5): versioned, per-site sets of reference values.

// 'discarded': a draft its author (or a supervisor) gave up; kept, readable, never in force again.
export const EDITION_STATES = ['draft', 'in_review', 'in_force', 'retired', 'discarded'] as const;
export type EditionState = (typeof EDITION_STATES)[number];
export const VALUE_PHASES = ['cr', 'l', 'g', 'aq'] as const;
export const VALUE_SCALES = ['conventional', 'absolute'] as const;
export const VALUE_EVENT_ACTIONS = ['added', 'changed', 'removed'] as const;
export const VALUE_EVENT_ORIGINS = ['editor', 'import', 'rebase', 'seed'] as const;

/** The property vocabulary (lib/reference/properties.ts), mirrored so values can reference it. */
export const refProperties = mysqlTable('ref_properties', {
  code: varchar('code', { length: 40 }).primaryKey(),
  label: varchar('label', { length: 120 }).notNull(),
  unit: varchar('unit', { length: 24 }).notNull(),
  kind: varchar('kind', { length: 24 }).notNull(),
});

/** A chemical species in a phase: `Cl-` (g, −1), `CaCl2·6H2O` (cr, 0). Shared by all sites; it carries no site data. */
export const refSpecies = mysqlTable(
  'ref_species',
  {
    id: id(),
    // Binary collation (set in the migration): "Co" and "CO" are different species.
    formula: varchar('formula', { length: 64 }).notNull(),
    phase: mysqlEnum('phase', VALUE_PHASES).notNull(),
    charge: int('charge').notNull(),
    createdAt: at('created_at').notNull(),
  },
  (t) => [uniqueIndex('ref_species_identity').on(t.formula, t.phase, t.charge)],
);

export const editions = mysqlTable(
  'editions',
  {
    id: id(),
    siteId: ref('site_id').notNull().references(() => sites.id),
    number: int('number').notNull(),
    state: mysqlEnum('state', EDITION_STATES).notNull(),
    // The edition in force this one was copied from (drafts are compared and rebased against it).
    baseEditionId: ref('base_edition_id'),
    changeSummary: text('change_summary').notNull(),
    authorUserId: ref('author_user_id').notNull().references(() => users.id),
    approverUserId: ref('approver_user_id').references(() => users.id),
    rejectedByUserId: ref('rejected_by_user_id').references(() => users.id),
    rejectionReason: text('rejection_reason'),
    createdAt: at('created_at').notNull(),
    updatedAt: at('updated_at').notNull(),
    submittedAt: at('submitted_at'),
    rejectedAt: at('rejected_at'),
    inForceAt: at('in_force_at'),
    retiredAt: at('retired_at'),
    // Bumped on every change to the values; part of the ETag of a draft.
    revision: int('revision').notNull().default(1),
    valueCount: int('value_count').notNull().default(0),
    // SHA-256 of the canonical values, set when the edition comes into force (immutable after).
    contentHash: varchar('content_hash', { length: 64 }),
    // 1 while in force, NULL otherwise: the unique index makes "one edition in force per site" hold in the database.
    inForceSlot: tinyint('in_force_slot'),
  },
  (t) => [
    uniqueIndex('editions_site_number').on(t.siteId, t.number),
    uniqueIndex('editions_one_in_force').on(t.siteId, t.inForceSlot),
    index('editions_site_state').on(t.siteId, t.state),
  ],
);

/** One reference value in one edition. Values are decimal strings exactly as published (never float). */
export const editionValues = mysqlTable(
  'edition_values',
  {
    id: id(),
    editionId: ref('edition_id').notNull().references(() => editions.id),
    speciesId: ref('species_id').notNull().references(() => refSpecies.id),
    property: varchar('property', { length: 40 }).notNull().references(() => refProperties.code),
    coordination: int('coordination'),
    // species|phase|property|coordination — the identity of a value across editions (binary collation, set in the migration).
    valueKey: varchar('value_key', { length: 191 }).notNull(),
    value: varchar('value', { length: 40 }).notNull(),
    uncertainty: varchar('uncertainty', { length: 40 }),
    unit: varchar('unit', { length: 24 }).notNull(),
    structure: varchar('structure', { length: 60 }),
    scale: mysqlEnum('scale', VALUE_SCALES),
    source: text('source').notNull(),
    fromMemory: boolean('from_memory').notNull(),
    note: text('note'),
  },
  (t) => [uniqueIndex('edition_values_key').on(t.editionId, t.valueKey), index('edition_values_value_key').on(t.valueKey)],
);

/** Every change to a value inside an edition: its history across editions, with who and how. */
export const editionValueEvents = mysqlTable(
  'edition_value_events',
  {
    id: id(),
    siteId: ref('site_id').notNull(),
    editionId: ref('edition_id').notNull().references(() => editions.id),
    valueKey: varchar('value_key', { length: 191 }).notNull(),
    action: mysqlEnum('action', VALUE_EVENT_ACTIONS).notNull(),
    before: json('before'),
    after: json('after'),
    origin: mysqlEnum('origin', VALUE_EVENT_ORIGINS).notNull(),
    actorUserId: ref('actor_user_id'),
    at: at('at').notNull(),
  },
  (t) => [index('edition_value_events_edition').on(t.editionId), index('edition_value_events_key').on(t.siteId, t.valueKey)],
);
