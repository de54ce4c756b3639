// The server's decision for one mutation, kept pure so the HTTP server and the in-memory model of
// the property tests decide alike (design.md §4).

export interface ServerRecordState {
  revision: number;
  /** An open conflict (or edition drift) on the record: every further edit joins it. */
  awaitingReview: boolean;
}

export type MutationDecision =
  | { kind: 'apply'; revision: number }
  | { kind: 'conflict' }
  | { kind: 'reject'; reason: string };

/**
 * Base revision equal to the server's → applied as revision + 1. Anything else → conflict: the
 * record keeps the server's version and the incoming one joins the review. Nothing is overwritten.
 *
 * One exception keeps a device from conflicting with itself: `ownSinceBase` says every change the
 * record took after the base revision was an accepted mutation of this same device (its reply was
 * lost on the way back, and a later edit merged into the queue on the old base). The device made
 * the new content on top of those changes, so it is applied as revision + 1.
 */
export function decideMutation(server: ServerRecordState | null, baseRevision: number, ownSinceBase = false): MutationDecision {
  if (!server) {
    if (baseRevision === 0) return { kind: 'apply', revision: 1 };
    return { kind: 'reject', reason: `No such record on this site (the change was based on revision ${baseRevision}).` };
  }
  if (server.awaitingReview) return { kind: 'conflict' };
  if (server.revision === baseRevision) return { kind: 'apply', revision: server.revision + 1 };
  if (ownSinceBase && baseRevision < server.revision) return { kind: 'apply', revision: server.revision + 1 };
  return { kind: 'conflict' };
}
