// An in-memory model of the push/pull server for property tests: the same decision function
// (decideMutation) and the same rules (replays answered with the first outcome, conflicts keep the
// server's version and collect incoming ones, a change log read by cursor). Test support only.
import { sameJson } from '../canonical-json';
import { decideMutation } from '../decide-mutation';
import { leaveOutSentContent, SYNC_PROTOCOL, type Mutation, type MutationOutcome, type PullResponse, type ServerRecord } from '../protocol';

interface Rec {
  record: ServerRecord;
  history: unknown[];
  /** The change log of this record: the revision each change left and the device whose mutation made it (null: a conflict flag or a resolution). */
  changes: { revision: number; device: string | null }[];
}

export class MemoryServer {
  records = new Map<string, Rec>();
  outcomes = new Map<string, MutationOutcome>();
  conflicts = new Map<string, { id: string; recordId: string; open: boolean; versions: unknown[] }>();
  log: { seq: number; id: string }[] = [];
  seq = 0;
  private n = 0;

  /** One push, answered in the current protocol (no record content sent back that the device sent). */
  push(mutations: Mutation[], device = 'device'): MutationOutcome[] {
    const outcomes = mutations.map((m) => {
      const first = this.outcomes.get(m.mutationId);
      if (first) return first.status === 'retry' ? first : { ...first, ...this.withRecord(m.recordId, first), duplicate: true as const };
      const o = this.apply(m, device);
      this.outcomes.set(m.mutationId, o);
      return o;
    });
    return leaveOutSentContent(mutations, outcomes);
  }

  private withRecord(id: string, o: MutationOutcome) {
    const r = this.records.get(id);
    return 'record' in o && r ? { record: { ...r.record } } : {};
  }

  private apply(m: Mutation, device: string): MutationOutcome {
    const rec = this.records.get(m.recordId);
    if (rec && sameJson(rec.record.content, m.content) && !rec.record.awaitingReview) {
      return { mutationId: m.mutationId, recordId: m.recordId, status: 'applied', revision: rec.record.revision, record: { ...rec.record } };
    }
    const since = rec?.changes.filter((c) => c.revision > m.baseRevision) ?? [];
    const ownSinceBase = since.length > 0 && since.every((c) => c.device === device);
    const d = decideMutation(rec ? { revision: rec.record.revision, awaitingReview: rec.record.awaitingReview } : null, m.baseRevision, ownSinceBase);
    if (d.kind === 'reject') return { mutationId: m.mutationId, recordId: m.recordId, status: 'rejected', reason: d.reason };
    if (d.kind === 'apply') {
      const seq = this.nextSeq(m.recordId);
      const record: ServerRecord = { entity: m.entity, id: m.recordId, revision: d.revision, seq, awaitingReview: false, content: m.content };
      this.records.set(m.recordId, { record, history: [...(rec?.history ?? []), m.content], changes: [...(rec?.changes ?? []), { revision: d.revision, device }] });
      return { mutationId: m.mutationId, recordId: m.recordId, status: 'applied', revision: d.revision, record: { ...record } };
    }
    let c = [...this.conflicts.values()].find((x) => x.recordId === m.recordId && x.open);
    if (!c) {
      c = { id: `c${++this.n}`, recordId: m.recordId, open: true, versions: [] };
      this.conflicts.set(c.id, c);
    }
    c.versions.push(m.content);
    if (!rec!.record.awaitingReview) {
      rec!.record = { ...rec!.record, awaitingReview: true, seq: this.nextSeq(m.recordId) };
      rec!.changes.push({ revision: rec!.record.revision, device: null });
    }
    return { mutationId: m.mutationId, recordId: m.recordId, status: 'conflict', conflictId: c.id, record: { ...rec!.record } };
  }

  private nextSeq(id: string) {
    this.seq++;
    this.log.push({ seq: this.seq, id });
    return this.seq;
  }

  pull(cursor: number, limit: number): PullResponse {
    const rows = this.log.filter((l) => l.seq > cursor).slice(0, limit);
    const ids = [...new Set(rows.map((r) => r.id))];
    return { protocol: SYNC_PROTOCOL, records: ids.map((id) => ({ ...this.records.get(id)!.record })), cursor: rows.at(-1)?.seq ?? cursor, more: rows.length === limit };
  }

  /** A supervisor settles a conflict: `pick` -1 keeps the server's version, i ≥ 0 takes version i. */
  resolve(conflictId: string, pick: number) {
    const c = this.conflicts.get(conflictId)!;
    const rec = this.records.get(c.recordId)!;
    const content = pick < 0 || pick >= c.versions.length ? rec.record.content : c.versions[pick];
    rec.record = { ...rec.record, content, revision: rec.record.revision + 1, awaitingReview: false, seq: this.nextSeq(c.recordId) };
    rec.history.push(content);
    rec.changes.push({ revision: rec.record.revision, device: null });
    c.open = false;
  }
}
