import 'server-only';
import type { NextRequest } from 'next/server';
import type { UserActor } from '@/lib/auth/current';
import type { Actor } from '@/lib/server/actor';
import { AppError } from '@/lib/server/errors';
import { PROTOCOL_HEADER, protocolProblem } from '@/lib/sync/protocol';

/**
 * Sync is for a signed-in person's device (not an API token), speaking a protocol we still accept.
 * Returns the user and the protocol version the device speaks (its answer is given in that version).
 */
export function requireSyncUser(req: NextRequest, actor: Actor): { user: UserActor; protocol: number } {
  const header = req.headers.get(PROTOCOL_HEADER);
  const problem = protocolProblem(header);
  if (problem) throw new AppError('upgrade_required', problem);
  if (actor.kind !== 'user') throw new AppError('forbidden', 'Sync is for signed-in devices, not API tokens.');
  return { user: actor, protocol: Number(header) };
}
