// The synced SHEET record: one saved calculation. Pure zod/mini (no React, Next.js, DOM or database):
// the workbench form, the device's local store and the sync push handler all use this schema.
import * as z from '@/lib/validation/zod-mini';

export const SHEET_KINDS = ['cycle', 'dissolution', 'reaction', 'calorimetry'] as const;
export type SheetKind = (typeof SHEET_KINDS)[number];

/** draft → submitted → signed_off. A signed-off sheet is locked; a later change starts a new version. */
export const SHEET_STATUSES = ['draft', 'submitted', 'signed_off'] as const;
export type SheetStatus = (typeof SHEET_STATUSES)[number];

/** Device-made ids are UUIDs (v7 from `lib/ids.ts`); any version is accepted, lowercase or not. */
export const recordIdSchema = z.string().check(z.regex(/^[0-9a-fA-F]{8}-[0-9a-fA-F]{4}-[0-9a-fA-F]{4}-[0-9a-fA-F]{4}-[0-9a-fA-F]{12}$/, { message: 'Must be a UUID' }));
/** Ids of rows made elsewhere (users, areas, editions): app-made varchar(36). */
export const refIdSchema = z.string().check(z.minLength(1), z.maxLength(36));
export const isoTimeSchema = z.iso.datetime({ offset: true, message: 'Must be an ISO 8601 date-time' });

/**
 * Where one input value of the problem came from. `path` points into `problem` (e.g.
 * ['problem', 'values', 'ionization_energy_1']). An `edition` input can be re-read from another
 * edition (edition drift, re-solve with the edition in force); an `entered` one was typed in.
 */
export const resolvedInputSchema = z.object({
  path: z.array(z.union([z.string().check(z.maxLength(100)), z.number().check(z.int(), z.minimum(0))])).check(z.minLength(1), z.maxLength(12)),
  origin: z.discriminatedUnion('type', [
    z.object({
      type: z.literal('edition'),
      editionId: refIdSchema,
      species: z.string().check(z.minLength(1), z.maxLength(80)),
      phase: z.enum(['cr', 'l', 'g', 'aq']),
      property: z.string().check(z.minLength(1), z.maxLength(60)),
    }),
    z.object({ type: z.literal('entered'), note: z.optional(z.string().check(z.maxLength(500))) }),
  ]),
});
export type ResolvedInput = z.infer<typeof resolvedInputSchema>;

/**
 * The engine problem exactly as `solve()` from lib/thermo takes it: `{ kind, problem, batch? }`.
 * Only its envelope is checked here; a draft may hold an incomplete problem. The server runs the
 * engine's own schema when it recomputes, and a submitted or signed-off sheet must solve.
 */
export const sheetProblemSchema = z
  .looseObject({ kind: z.enum(SHEET_KINDS) })
  .check(z.refine((p) => JSON.stringify(p).length <= 200_000, { message: 'The problem is too large (over 200 kB)' }));

export const sheetSchema = z
  .object({
    id: recordIdSchema,
    kind: z.enum(SHEET_KINDS),
    title: z.string().check(z.trim(), z.minLength(1, { message: 'Give the sheet a title' }), z.maxLength(200)),
    /** Lot or batch reference as written on the plant's paperwork. */
    lotRef: z.nullable(z.string().check(z.trim(), z.maxLength(80))),
    areaId: z.nullable(refIdSchema),
    note: z.string().check(z.maxLength(10_000)),
    status: z.enum(SHEET_STATUSES),
    problem: z.nullable(sheetProblemSchema),
    /** Every input value with its source (edition value or typed in). */
    inputs: z.array(resolvedInputSchema).check(z.maxLength(500)),
    /** The result the device computed (the server stores its own and flags a difference). */
    result: z.nullable(z.unknown()),
    pinnedEditionId: z.nullable(refIdSchema),
    engineVersion: z.nullable(z.string().check(z.maxLength(60))),
    /** Sheet version (not the sync revision): 1, then +1 for each version after a sign-off. */
    version: z.number().check(z.int(), z.minimum(1), z.maximum(10_000)),
    previousVersionId: z.nullable(recordIdSchema),
    authorId: refIdSchema,
    signedOffBy: z.nullable(refIdSchema),
    signedOffAt: z.nullable(isoTimeSchema),
    /** Tombstone: a deleted sheet stays as a record so every device learns of the delete. */
    deleted: z.boolean(),
    createdAt: isoTimeSchema,
    updatedAt: isoTimeSchema,
  })
  .check(
    z.superRefine((s, ctx) => {
      if (s.problem && s.problem.kind !== s.kind) ctx.addIssue({ code: 'custom', path: ['problem', 'kind'], message: `Must match the sheet kind (${s.kind})` });
      if (s.status === 'signed_off' && (!s.signedOffBy || !s.signedOffAt)) {
        ctx.addIssue({ code: 'custom', path: ['signedOffBy'], message: 'A signed-off sheet names who signed it off and when' });
      }
      if (s.status !== 'signed_off' && (s.signedOffBy || s.signedOffAt)) {
        ctx.addIssue({ code: 'custom', path: ['signedOffBy'], message: 'Only a signed-off sheet has a sign-off' });
      }
      if ((s.version > 1) !== (s.previousVersionId !== null)) {
        ctx.addIssue({ code: 'custom', path: ['previousVersionId'], message: 'Version 1 has no previous version; later versions name theirs' });
      }
    }),
  );
export type Sheet = z.infer<typeof sheetSchema>;

/** Fields a person edits and a supervisor may merge field by field (reconcile screen). */
export const SHEET_MERGE_FIELDS = ['title', 'lotRef', 'areaId', 'note', 'status', 'problem', 'inputs', 'pinnedEditionId', 'deleted'] as const;
