import 'server-only';
import { and, eq, sql } from 'drizzle-orm';
import { db, type Tx } from '@/db/client';
import { editions, editionValueEvents, sites } from '@/db/schema';
import { diffEditions } from '@/lib/editions/diff-editions';
import type { ParsedRow } from '@/lib/editions/parse-change-csv';
import { type Plan, planChanges } from '@/lib/editions/plan-changes';
import { type RebaseConflict, rebaseChanges } from '@/lib/editions/rebase-changes';
import { newId } from '@/lib/ids';
import { can } from '@/lib/auth/permissions';
import type { Actor } from '@/lib/server/actor';
import { audit } from '@/lib/server/audit';
import { AppError } from '@/lib/server/errors';
import { contentHash, deleteValues, ensureProperties, insertValues, recordValueEvents, type ValueEvent } from './edition-values';
import { type Edition, getEditionInForce, getEditionOrThrow, getEditionValues } from './editions';

type UserActor = Extract<Actor, { kind: 'user' }>;

/** Editions are authored and approved by people, never by API tokens. */
export function requirePerson(actor: Actor): UserActor {
  if (actor.kind !== 'user') throw new AppError('forbidden', 'Only a signed-in person can do this, not an API token.');
  return actor;
}

/** Every workflow step runs in one transaction holding the site row's lock, so steps on one site never interleave. */
async function inSiteLock<T>(siteId: string, work: (tx: Tx) => Promise<T>): Promise<T> {
  return db().transaction(async (tx) => {
    await tx.execute(sql`SELECT id FROM ${sites} WHERE id = ${siteId} FOR UPDATE`);
    return work(tx);
  });
}

function requireAuthor(actor: UserActor, e: Edition, verb: string) {
  if (e.authorUserId !== actor.userId) throw new AppError('forbidden', `Only the author of edition No. ${e.number} may ${verb} it.`);
}

function requireState(e: Edition, states: Edition['state'][], verb: string) {
  if (!states.includes(e.state)) {
    const label = e.state.replace('_', ' ');
    throw new AppError('conflict', `Edition No. ${e.number} is ${label}; only an edition ${states.map((s) => s.replace('_', ' ')).join(' or ')} can be ${verb}.`, { state: e.state });
  }
}

/** A new draft: a copy of the edition in force (or empty on a site that has none), numbered next. */
export async function createDraft(actor: UserActor, changeSummary: string): Promise<Edition> {
  return inSiteLock(actor.siteId, async (tx) => {
    await ensureProperties(tx);
    const base = await getEditionInForce(actor.siteId, tx);
    const [{ next } = { next: 1 }] = await tx
      .select({ next: sql<number>`COALESCE(MAX(${editions.number}), 0) + 1` })
      .from(editions)
      .where(eq(editions.siteId, actor.siteId));
    const id = newId();
    const now = new Date();
    const values = base ? await getEditionValues(base.id, tx) : [];
    await tx.insert(editions).values({
      id,
      siteId: actor.siteId,
      number: Number(next),
      state: 'draft',
      baseEditionId: base?.id ?? null,
      changeSummary,
      authorUserId: actor.userId,
      createdAt: now,
      updatedAt: now,
      valueCount: values.length,
    });
    await insertValues(tx, id, values);
    await audit(tx, actor, { action: 'edition.drafted', entityType: 'edition', entityId: id, after: { number: Number(next), baseEditionId: base?.id ?? null, changeSummary } });
    return getEditionOrThrow(actor.siteId, id, tx);
  });
}

export async function updateDraftSummary(actor: UserActor, editionId: string, changeSummary: string): Promise<Edition> {
  return inSiteLock(actor.siteId, async (tx) => {
    const e = await getEditionOrThrow(actor.siteId, editionId, tx);
    requireState(e, ['draft'], 'edited');
    requireAuthor(actor, e, 'edit');
    await tx.update(editions).set({ changeSummary, updatedAt: new Date() }).where(eq(editions.id, e.id));
    await audit(tx, actor, { action: 'edition.summary_changed', entityType: 'edition', entityId: e.id, before: { changeSummary: e.changeSummary }, after: { changeSummary } });
    return getEditionOrThrow(actor.siteId, e.id, tx);
  });
}

/**
 * Apply a validated change list (CSV import or the editor) to a draft. With `apply: false` it only
 * plans (the preview). Any row error → nothing applied. A stale `revision` → 409, nothing applied.
 */
export async function applyChanges(
  actor: UserActor,
  editionId: string,
  rows: readonly ParsedRow[],
  options: { apply: boolean; origin: 'editor' | 'import'; revision?: number },
): Promise<{ plan: Plan; edition: Edition }> {
  const work = async (tx: Tx) => {
    const e = await getEditionOrThrow(actor.siteId, editionId, tx);
    requireState(e, ['draft'], 'changed');
    requireAuthor(actor, e, 'change');
    if (options.revision !== undefined && options.revision !== e.revision) {
      throw new AppError('conflict', `The draft changed since you opened it (revision ${e.revision}, you had ${options.revision}); reload it and apply your change again.`, { revision: e.revision });
    }
    const plan = planChanges(await getEditionValues(e.id, tx), rows);
    if (!plan.ok || !options.apply) return { plan, edition: e };
    const effective = plan.changes.filter((c) => c.kind !== 'unchanged');
    if (effective.length === 0) return { plan, edition: e };
    await deleteValues(tx, e.id, effective.filter((c) => c.kind !== 'added').map((c) => c.key));
    await insertValues(tx, e.id, effective.flatMap((c) => (c.after ? [c.after] : [])));
    const events: ValueEvent[] = effective.map((c) => ({ key: c.key, action: c.kind as ValueEvent['action'], before: c.before, after: c.after }));
    await recordValueEvents(tx, actor.siteId, e.id, events, options.origin, actor);
    await tx
      .update(editions)
      .set({ revision: sql`${editions.revision} + 1`, valueCount: plan.values.length, updatedAt: new Date() })
      .where(eq(editions.id, e.id));
    if (options.origin === 'import') {
      await audit(tx, actor, { action: 'edition.imported', entityType: 'edition', entityId: e.id, after: plan.counts });
    }
    return { plan, edition: await getEditionOrThrow(actor.siteId, e.id, tx) };
  };
  // A preview takes no lock and writes nothing.
  return options.apply ? inSiteLock(actor.siteId, work) : db().transaction(work);
}

/**
 * Give up a draft: it becomes `discarded` — kept with its values and history (readable forever,
 * its number never reused), but never submitted, changed or in force. Its author may discard it, or
 * a supervisor (a draft left behind by someone who moved on).
 */
export async function discardDraft(actor: UserActor, editionId: string): Promise<Edition> {
  return inSiteLock(actor.siteId, async (tx) => {
    const e = await getEditionOrThrow(actor.siteId, editionId, tx);
    if (e.authorUserId !== actor.userId && !can(actor.role, 'edition.approve')) {
      throw new AppError('forbidden', `Only the author of edition No. ${e.number} or a supervisor may discard it.`);
    }
    requireState(e, ['draft'], 'discarded');
    await tx.update(editions).set({ state: 'discarded', updatedAt: new Date() }).where(eq(editions.id, e.id));
    await audit(tx, actor, { action: 'edition.discarded', entityType: 'edition', entityId: e.id, before: { state: 'draft' }, after: { state: 'discarded' } });
    return getEditionOrThrow(actor.siteId, e.id, tx);
  });
}

/** Take an edition back out of review (its author, before anyone approves it): it is a draft again. */
export async function withdrawFromReview(actor: UserActor, editionId: string): Promise<Edition> {
  return inSiteLock(actor.siteId, async (tx) => {
    const e = await getEditionOrThrow(actor.siteId, editionId, tx);
    requireAuthor(actor, e, 'withdraw');
    requireState(e, ['in_review'], 'withdrawn');
    await tx.update(editions).set({ state: 'draft', submittedAt: null, updatedAt: new Date() }).where(eq(editions.id, e.id));
    await audit(tx, actor, { action: 'edition.withdrawn', entityType: 'edition', entityId: e.id, before: { state: 'in_review' }, after: { state: 'draft' } });
    return getEditionOrThrow(actor.siteId, e.id, tx);
  });
}

export async function submitForReview(actor: UserActor, editionId: string): Promise<Edition> {
  return inSiteLock(actor.siteId, async (tx) => {
    const e = await getEditionOrThrow(actor.siteId, editionId, tx);
    requireAuthor(actor, e, 'submit');
    requireState(e, ['draft'], 'submitted');
    if (e.changeSummary.trim() === '') {
      throw new AppError('validation', 'Describe what this edition changes and why before submitting it.', { fields: [{ field: 'changeSummary', message: 'required before submitting' }] });
    }
    if (e.valueCount === 0) throw new AppError('validation', 'An empty edition cannot be submitted.', { fields: [{ field: 'values', message: 'add values first' }] });
    const now = new Date();
    await tx.update(editions).set({ state: 'in_review', submittedAt: now, updatedAt: now }).where(eq(editions.id, e.id));
    await audit(tx, actor, { action: 'edition.submitted', entityType: 'edition', entityId: e.id, before: { state: e.state }, after: { state: 'in_review' } });
    return getEditionOrThrow(actor.siteId, e.id, tx);
  });
}

/** Four eyes: the approver (or rejecter) neither authored the edition nor changed any of its values. */
async function requireOtherThanAuthors(tx: Tx, actor: UserActor, e: Edition, verb: string) {
  if (e.authorUserId === actor.userId) {
    throw new AppError('forbidden', `You authored edition No. ${e.number}; a supervisor other than its author must ${verb} it.`, { reason: 'own_edition' });
  }
  const [contributed] = await tx
    .select({ id: editionValueEvents.id })
    .from(editionValueEvents)
    .where(and(eq(editionValueEvents.editionId, e.id), eq(editionValueEvents.actorUserId, actor.userId), sql`${editionValueEvents.origin} <> 'rebase'`))
    .limit(1);
  if (contributed) throw new AppError('forbidden', `You changed values in edition No. ${e.number}; a supervisor who did not must ${verb} it.`, { reason: 'own_changes' });
}

export async function approveEdition(actor: UserActor, editionId: string): Promise<{ edition: Edition; retired: Edition | null }> {
  return inSiteLock(actor.siteId, async (tx) => {
    const e = await getEditionOrThrow(actor.siteId, editionId, tx);
    await requireOtherThanAuthors(tx, actor, e, 'approve');
    requireState(e, ['in_review'], 'approved');
    const current = await getEditionInForce(actor.siteId, tx);
    if ((current?.id ?? null) !== e.baseEditionId) {
      throw new AppError(
        'conflict',
        `Rebase first: edition No. ${e.number} was drafted from ${e.baseEditionId ? 'an edition that is no longer in force' : 'no edition'}, and No. ${current?.number} is in force now. Rebase it onto No. ${current?.number}, then approve.`,
        { reason: 'rebase_required', inForceEditionId: current?.id ?? null, baseEditionId: e.baseEditionId },
      );
    }
    const now = new Date();
    if (current) {
      await tx.update(editions).set({ state: 'retired', retiredAt: now, inForceSlot: null, updatedAt: now }).where(eq(editions.id, current.id));
      await audit(tx, actor, { action: 'edition.retired', entityType: 'edition', entityId: current.id, before: { state: 'in_force' }, after: { state: 'retired', replacedBy: e.id } });
    }
    const hash = contentHash(await getEditionValues(e.id, tx));
    await tx
      .update(editions)
      .set({ state: 'in_force', approverUserId: actor.userId, inForceAt: now, inForceSlot: 1, contentHash: hash, updatedAt: now })
      .where(eq(editions.id, e.id));
    await audit(tx, actor, { action: 'edition.approved', entityType: 'edition', entityId: e.id, before: { state: 'in_review' }, after: { state: 'in_force', contentHash: hash } });
    return { edition: await getEditionOrThrow(actor.siteId, e.id, tx), retired: current ? await getEditionOrThrow(actor.siteId, current.id, tx) : null };
  });
}

export async function rejectEdition(actor: UserActor, editionId: string, reason: string): Promise<Edition> {
  return inSiteLock(actor.siteId, async (tx) => {
    const e = await getEditionOrThrow(actor.siteId, editionId, tx);
    await requireOtherThanAuthors(tx, actor, e, 'reject');
    requireState(e, ['in_review'], 'rejected');
    const now = new Date();
    await tx
      .update(editions)
      .set({ state: 'draft', rejectionReason: reason, rejectedByUserId: actor.userId, rejectedAt: now, submittedAt: null, updatedAt: now })
      .where(eq(editions.id, e.id));
    await audit(tx, actor, { action: 'edition.rejected', entityType: 'edition', entityId: e.id, before: { state: 'in_review' }, after: { state: 'draft', reason } });
    return getEditionOrThrow(actor.siteId, e.id, tx);
  });
}

/**
 * Carry the draft's changes (relative to its base) onto the edition now in force. The author may
 * rebase a draft or an edition in review; a supervisor may rebase an edition in review (it adds no
 * values of their own). Where both changed one value, the draft's value is kept and reported.
 */
export async function rebaseEdition(actor: UserActor, editionId: string): Promise<{ edition: Edition; carried: number; conflicts: RebaseConflict[] }> {
  return inSiteLock(actor.siteId, async (tx) => {
    const e = await getEditionOrThrow(actor.siteId, editionId, tx);
    requireState(e, ['draft', 'in_review'], 'rebased');
    if (e.authorUserId !== actor.userId && !(e.state === 'in_review' && can(actor.role, 'edition.approve'))) {
      throw new AppError('forbidden', `Only the author may rebase draft No. ${e.number}; a supervisor may rebase it once it is in review.`);
    }
    const current = await getEditionInForce(actor.siteId, tx);
    if (!current) throw new AppError('conflict', 'No edition is in force on this site: there is nothing to rebase onto.');
    if (current.id === e.baseEditionId) throw new AppError('conflict', `Edition No. ${e.number} is already based on No. ${current.number}, the edition in force.`);
    const base = e.baseEditionId ? await getEditionValues(e.baseEditionId, tx) : [];
    const draft = await getEditionValues(e.id, tx);
    const result = rebaseChanges(base, draft, await getEditionValues(current.id, tx));
    const diff = diffEditions(draft, result.values);
    const events: ValueEvent[] = [
      ...diff.added.map((d) => ({ key: d.key, action: 'added' as const, before: null, after: d.after })),
      ...diff.changed.map((d) => ({ key: d.key, action: 'changed' as const, before: d.before, after: d.after })),
      ...diff.removed.map((d) => ({ key: d.key, action: 'removed' as const, before: d.before, after: null })),
    ];
    await deleteValues(tx, e.id, [...diff.changed, ...diff.removed].map((d) => d.key));
    await insertValues(tx, e.id, [...diff.added.map((d) => d.after), ...diff.changed.map((d) => d.after)]);
    await recordValueEvents(tx, actor.siteId, e.id, events, 'rebase', actor);
    await tx
      .update(editions)
      .set({ baseEditionId: current.id, revision: sql`${editions.revision} + 1`, valueCount: result.values.length, updatedAt: new Date() })
      .where(eq(editions.id, e.id));
    await audit(tx, actor, {
      action: 'edition.rebased',
      entityType: 'edition',
      entityId: e.id,
      before: { baseEditionId: e.baseEditionId },
      after: { baseEditionId: current.id, carried: result.carried, conflicts: result.conflicts.map((c) => c.key) },
    });
    return { edition: await getEditionOrThrow(actor.siteId, e.id, tx), carried: result.carried, conflicts: result.conflicts };
  });
}
