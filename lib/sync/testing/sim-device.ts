// A simulated device for property tests: an in-memory stand-in for the Dexie store that runs the
// SAME pure protocol functions as lib/local (queueEdit, applyOutcome, mergePulled). Test support only.
import { applyOutcome, mergePulled, queueEdit, type LocalRecord, type QueuedMutation, type RejectedChange } from '../local-state';
import type { Entity, MutationOutcome, PullResponse } from '../protocol';

export class SimDevice {
  records = new Map<string, LocalRecord>();
  outbox = new Map<string, QueuedMutation>();
  rejected: RejectedChange[] = [];
  cursor = 0;
  /** The last content this device saved for each record (what must never be lost). */
  lastEdits = new Map<string, unknown>();
  private n = 0;

  constructor(readonly name: string, private readonly makeId: () => string) {}

  edit(entity: Entity, recordId: string, content: unknown) {
    const local = this.records.get(recordId);
    const queued = queueEdit(this.outbox.get(recordId), { entity, recordId, content }, local?.serverRevision ?? 0, this.makeId(), `t${++this.n}`);
    this.outbox.set(recordId, queued);
    this.records.set(recordId, local ? { ...local, content, pending: true } : { entity, id: recordId, content, serverContent: null, serverRevision: 0, serverSeq: 0, awaitingReview: false, pending: true });
    this.lastEdits.set(recordId, content);
  }

  /** Snapshot of the queue as a push batch (the entries stay until their outcome arrives). */
  batch(): QueuedMutation[] {
    return [...this.outbox.values()].map((m) => ({ ...m }));
  }

  receiveOutcomes(sent: QueuedMutation[], outcomes: MutationOutcome[]) {
    const byId = new Map(outcomes.map((o) => [o.mutationId, o]));
    for (const m of sent) {
      const o = byId.get(m.mutationId);
      if (!o) continue;
      const effect = applyOutcome(this.records.get(m.recordId), this.outbox.get(m.recordId), m, o, 'now');
      if (effect.queued === null) this.outbox.delete(m.recordId);
      else if (effect.queued) this.outbox.set(m.recordId, effect.queued);
      if (effect.record === null) this.records.delete(m.recordId);
      else if (effect.record) this.records.set(m.recordId, effect.record);
      if (effect.rejected) this.rejected.push(effect.rejected);
    }
  }

  receivePage(page: PullResponse) {
    for (const r of page.records) {
      const next = mergePulled(this.records.get(r.id), r, this.outbox.has(r.id));
      if (next) this.records.set(r.id, next);
    }
    this.cursor = Math.max(this.cursor, page.cursor);
  }
}
