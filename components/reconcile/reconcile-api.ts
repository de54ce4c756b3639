// Client-side calls and types of the reconcile endpoints (GET /api/v1/conflicts…, POST …/resolve).
import { getJson, postJson } from '@/components/ui/post-json';
import type { ConflictSummary } from '@/lib/sync/conflict-summary';

export type { ConflictSummary };

export interface ConflictDetail extends ConflictSummary {
  server: { revision: number; content: Record<string, unknown>; serverResult: unknown };
  versions: { id: string; userId: string; userName: string; baseRevision: number; createdAt: string; content: Record<string, unknown> }[];
  differences: { field: string; server: unknown; versions: unknown[] }[];
  mergeFields: string[];
  drift: { pinnedEditionId: string; inForceEditionId: string; pinnedResult: unknown; inForceResult: unknown; missing: string[] } | null;
}

export type ResolveBody =
  | { action: 'keep_server' }
  | { action: 'keep_device'; versionId: string }
  | { action: 'merge'; fields: Record<string, string> }
  | { action: 'keep_pinned' }
  | { action: 'resolve_in_force' };


export const fetchConflicts = (status: 'open' | 'resolved') => getJson<{ conflicts: ConflictSummary[] }>(`/api/v1/conflicts?status=${status}`).then((b) => b.conflicts);
export const fetchConflict = (id: string) => getJson<ConflictDetail>(`/api/v1/conflicts/${encodeURIComponent(id)}`);

export async function resolve(id: string, body: ResolveBody) {
  const r = await postJson(`/api/v1/conflicts/${encodeURIComponent(id)}/resolve`, body);
  if (!r.ok) throw new Error(r.message);
  return r.data;
}
