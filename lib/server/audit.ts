import 'server-only';
import { auditLog } from '@/db/schema';
import type { Db, Tx } from '@/db/client';
import type { Actor } from './actor';

export interface AuditEntry {
  action: string;
  entityType: string;
  entityId: string;
  before?: unknown;
  after?: unknown;
}

/** Write one audit row (who, what, when, before and after) inside the caller's transaction. */
export async function audit(tx: Db | Tx, actor: Actor, entry: AuditEntry): Promise<void> {
  await tx.insert(auditLog).values({
    siteId: actor.siteId,
    actorUserId: actor.kind === 'user' ? actor.userId : null,
    actorTokenId: actor.kind === 'token' ? actor.tokenId : null,
    action: entry.action,
    entityType: entry.entityType,
    entityId: entry.entityId,
    before: entry.before ?? null,
    after: entry.after ?? null,
    at: new Date(),
  });
}
