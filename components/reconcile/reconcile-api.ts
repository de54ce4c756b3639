// Client-side calls and types of the reconcile endpoints (GET /api/v1/conflicts…, POST …/resolve).
import { getJson, postJson } from '@/components/ui/post-json';

export interface ConflictSummary {
  id: string;
  kind: 'edit' | 'drift';
  status: 'open' | 'resolved';
  entity: 'sheet' | 'bench_entry' | 'photo';
  recordId: string;
  title: string;
  sheetKind: string | null;
  createdAt: string;
  authors: { id: string; name: string }[];
  versionCount: number;
}

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
