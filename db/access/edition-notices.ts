import 'server-only';
import { and, eq, inArray, ne } from 'drizzle-orm';
import { db } from '@/db/client';
import { sites, users } from '@/db/schema';
import { env } from '@/lib/env';
import { sendMail } from '@/lib/mail/send-mail';
import { log } from '@/lib/server/log';
import type { Edition } from './editions';

// E-mail notices of the edition workflow. Sent after the transaction committed; a mail failure is
// logged and never undoes the step (the edition's state is the record, the mail only a notice).

async function safeSend(mail: Parameters<typeof sendMail>[0]) {
  try {
    await sendMail(mail);
  } catch (err) {
    log.error({ err, subject: mail.subject }, 'edition notice could not be sent');
  }
}

async function siteName(siteId: string) {
  const [s] = await db().select({ name: sites.name }).from(sites).where(eq(sites.id, siteId));
  return s?.name ?? 'your site';
}

/** Supervisors and admins of the site (not the author) are told an edition waits for review. */
export async function noticeSubmitted(e: Edition, authorName: string): Promise<void> {
  const to = await db()
    .select({ email: users.email })
    .from(users)
    .where(and(eq(users.siteId, e.siteId), eq(users.status, 'active'), inArray(users.role, ['supervisor', 'admin']), ne(users.id, e.authorUserId)));
  const name = await siteName(e.siteId);
  await safeSend({
    to: to.map((u) => u.email),
    subject: `Reference edition No. ${e.number} waits for your review`,
    text:
      `${authorName} submitted reference edition No. ${e.number} of ${name} for review.\n\n` +
      `What it changes:\n${e.changeSummary}\n\n` +
      `Review it (a supervisor other than its author approves or rejects it):\n${env().PUBLIC_URL}/editions/${e.id}\n`,
  });
}

/** Everyone active at the site is told a new edition is in force. */
export async function noticeInForce(e: Edition, approverName: string, retiredNumber: number | null): Promise<void> {
  const to = await db().select({ email: users.email }).from(users).where(and(eq(users.siteId, e.siteId), eq(users.status, 'active')));
  const name = await siteName(e.siteId);
  await safeSend({
    to: to.map((u) => u.email),
    subject: `Reference edition No. ${e.number} is now in force at ${name}`,
    text:
      `${approverName} approved reference edition No. ${e.number}; it is in force from ${e.inForceAt} (UTC).` +
      (retiredNumber !== null ? ` Edition No. ${retiredNumber} is retired and stays readable.` : '') +
      `\n\nWhat it changes:\n${e.changeSummary}\n\n` +
      `New sheets are solved with No. ${e.number}; devices fetch it at their next sync.\n${env().PUBLIC_URL}/editions/${e.id}\n`,
  });
}

/** The author is told their edition was sent back to draft, with the reason. */
export async function noticeRejected(e: Edition, rejecterName: string): Promise<void> {
  const [author] = await db().select({ email: users.email, status: users.status }).from(users).where(eq(users.id, e.authorUserId));
  if (!author || author.status !== 'active') return;
  await safeSend({
    to: author.email,
    subject: `Reference edition No. ${e.number} was sent back to draft`,
    text:
      `${rejecterName} sent reference edition No. ${e.number} back to draft.\n\nReason:\n${e.rejectionReason ?? ''}\n\n` +
      `Change it and submit it again:\n${env().PUBLIC_URL}/editions/${e.id}\n`,
  });
}
