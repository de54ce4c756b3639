// The sync protocol's version and the header that carries it: what the device's sync engine needs
// from the protocol, kept free of zod so the device does not load the server's message schemas.
// Re-exported by protocol.ts. See lib/sync/README.md.

/**
 * Bumped when a message changes. A device older than MIN_SYNC_PROTOCOL gets 426 and keeps its
 * queue; one between the two is answered in its own version.
 *   1 — first version.
 *   2 — a push outcome's record leaves out `content` when it is exactly what that mutation sent
 *       (`contentAsSent: true`); the device fills it in from its own copy (lib/sync/README.md).
 */
export const SYNC_PROTOCOL = 2;
export const MIN_SYNC_PROTOCOL = 1;
/** Header naming the protocol a device speaks, on push and pull. */
export const PROTOCOL_HEADER = 'x-rungbook-sync-protocol';

/** Why a device's protocol header is not accepted (→ 426, the device keeps its queue), or null. */
export function protocolProblem(header: string | null): string | null {
  const v = header === null ? NaN : Number(header);
  if (!Number.isInteger(v) || v < MIN_SYNC_PROTOCOL) {
    return `This app speaks sync protocol ${header ?? '(none)'}; the server needs ${MIN_SYNC_PROTOCOL} or later. Reload to update the app — your waiting changes are kept.`;
  }
  if (v > SYNC_PROTOCOL) return `This app speaks sync protocol ${v}, newer than the server's ${SYNC_PROTOCOL}. Try again after the server is updated; your waiting changes are kept.`;
  return null;
}
