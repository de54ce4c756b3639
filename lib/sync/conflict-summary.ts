// One conflict as the reconcile list shows it: sent by the server, read by the screen. Pure module.
import type { Entity } from './protocol';

/** A conflict in the supervisors' reconcile queue (an edit collision or edition drift). */
export interface ConflictSummary {
  id: string;
  kind: 'edit' | 'drift';
  status: 'open' | 'resolved';
  entity: Entity;
  recordId: string;
  title: string;
  sheetKind: string | null;
  createdAt: string;
  authors: { id: string; name: string }[];
  versionCount: number;
}
