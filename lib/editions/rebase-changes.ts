// Carry a draft's changes (relative to its base edition) onto the edition now in force.
import type { ReferenceValue } from '@/lib/reference/properties';
import { diffEditions, indexValues } from './diff-editions';
import { sameValue } from './value-key';

export interface RebaseConflict {
  key: string;
  /** The base edition's value (null: the draft added it). */
  base: ReferenceValue | null;
  /** The value in the edition now in force (null: removed there). */
  inForce: ReferenceValue | null;
  /** The draft's value (null: the draft removed it). The draft's value is kept. */
  draft: ReferenceValue | null;
}

export interface RebaseResult {
  values: ReferenceValue[];
  /** How many of the draft's changes were carried over. */
  carried: number;
  /** Keys changed both in the draft and, differently, in the edition now in force. */
  conflicts: RebaseConflict[];
}

/**
 * Three-way rebase: start from the edition now in force and re-apply each change the draft made
 * to its base. Where the edition in force changed the same value differently, the draft's change
 * still wins (it is what its author entered) and the key is reported as a conflict for the reviewer.
 */
export function rebaseChanges(base: readonly ReferenceValue[], draft: readonly ReferenceValue[], inForce: readonly ReferenceValue[]): RebaseResult {
  const changes = diffEditions(base, draft);
  const result = indexValues(inForce);
  const baseIdx = indexValues(base);
  const conflicts: RebaseConflict[] = [];
  const differs = (x: ReferenceValue | undefined, y: ReferenceValue | undefined) => (x && y ? !sameValue(x, y) : x !== y);
  const note = (key: string, wanted: ReferenceValue | undefined) => {
    const now = result.get(key);
    const was = baseIdx.get(key);
    // Upstream touched this key too, and not to the draft's own outcome.
    if (differs(now, was) && differs(now, wanted)) conflicts.push({ key, base: was ?? null, inForce: now ?? null, draft: wanted ?? null });
  };
  for (const { key, after } of [...changes.added, ...changes.changed]) {
    note(key, after);
    result.set(key, after);
  }
  for (const { key } of changes.removed) {
    note(key, undefined);
    result.delete(key);
  }
  const carried = changes.added.length + changes.changed.length + changes.removed.length;
  return { values: [...result.values()], carried, conflicts: conflicts.sort((a, b) => a.key.localeCompare(b.key)) };
}

