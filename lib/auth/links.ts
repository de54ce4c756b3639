import 'server-only';
import { and, eq, isNull } from 'drizzle-orm';
import { db } from '@/db/client';
import { oneTimeLinks, users } from '@/db/schema';
import { newId } from '@/lib/ids';
import { AppError } from '@/lib/server/errors';
import { hashSecret, newSecret } from '@/lib/server/secrets';

export type LinkPurpose = 'sign_in' | 'invitation';
export const LINK_LIFETIME_MINUTES: Record<LinkPurpose, number> = { sign_in: 15, invitation: 7 * 24 * 60 };

/** Make a one-time link secret for a user; only its hash is stored. */
export async function createOneTimeLink(userId: string, purpose: LinkPurpose): Promise<string> {
  const secret = newSecret('rbl_');
  const now = new Date();
  await db().insert(oneTimeLinks).values({
    id: newId(),
    userId,
    purpose,
    tokenHash: hashSecret(secret),
    expiresAt: new Date(now.getTime() + LINK_LIFETIME_MINUTES[purpose] * 60_000),
    createdAt: now,
  });
  return secret;
}

/**
 * Use a link once. Marking it used is a conditional UPDATE, so two clicks racing each other
 * cannot both succeed. Errors say plainly whether the link expired or was already used.
 */
export async function consumeOneTimeLink(secret: string, purpose: LinkPurpose) {
  const tokenHash = hashSecret(secret);
  const [link] = await db().select().from(oneTimeLinks).where(and(eq(oneTimeLinks.tokenHash, tokenHash), eq(oneTimeLinks.purpose, purpose)));
  const what = purpose === 'sign_in' ? 'sign-in link' : 'invitation link';
  if (!link) throw new AppError('not_found', `This ${what} is not valid. Ask for a new one.`);
  if (link.usedAt) throw new AppError('gone', `This ${what} has already been used. Ask for a new one.`);
  if (link.expiresAt.getTime() < Date.now()) throw new AppError('gone', `This ${what} has expired. Ask for a new one.`);
  const [result] = await db()
    .update(oneTimeLinks)
    .set({ usedAt: new Date() })
    .where(and(eq(oneTimeLinks.id, link.id), isNull(oneTimeLinks.usedAt)));
  if (result.affectedRows !== 1) throw new AppError('gone', `This ${what} has already been used. Ask for a new one.`);
  const [user] = await db().select().from(users).where(eq(users.id, link.userId));
  if (!user || user.status === 'deactivated') throw new AppError('forbidden', 'This account is not active. Ask your site admin.');
  return user;
}
