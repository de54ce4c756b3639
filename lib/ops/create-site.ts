// npm run site:create -- --code <code> --name "<site name>" --admin-email <e-mail> [--admin-name "<name>"]
// Creates a site and its first admin (no demo data). The admin gets an invitation link by
// e-mail (and printed here) to set a password.
import { parseArgs } from 'node:util';
import { pool } from '@/db/client';
import { users } from '@/db/schema';
import { ensureSite } from '@/db/seed/ensure-site';
import { createOneTimeLink } from '@/lib/auth/links';
import { env } from '@/lib/env';
import { newId } from '@/lib/ids';
import { sendMail } from '@/lib/mail/send-mail';
import { db } from '@/db/client';
import { emailSchema } from '@/lib/validation/auth';
import { eq } from 'drizzle-orm';

const { values } = parseArgs({
  options: { code: { type: 'string' }, name: { type: 'string' }, 'admin-email': { type: 'string' }, 'admin-name': { type: 'string' } },
});

function fail(message: string): never {
  console.error(`site:create: ${message}`);
  console.error('usage: npm run site:create -- --code <code> --name "<site name>" --admin-email <e-mail> [--admin-name "<name>"]');
  process.exit(2);
}

try {
  const code = values.code?.trim() ?? '';
  if (!/^[a-z0-9][a-z0-9-]{1,39}$/.test(code)) fail('--code: 2–40 lower-case letters, digits or hyphens');
  const name = values.name?.trim() ?? '';
  if (name.length < 2 || name.length > 120) fail('--name: 2–120 characters');
  const email = emailSchema.safeParse(values['admin-email'] ?? '');
  if (!email.success) fail('--admin-email: not a valid e-mail address');
  const [taken] = await db().select({ id: users.id }).from(users).where(eq(users.email, email.data));
  if (taken) fail(`--admin-email: ${email.data} already has an account`);

  const site = await ensureSite(code, name);
  if (!site.created) fail(`--code: a site with code "${code}" exists already`);
  const adminId = newId();
  await db().insert(users).values({ id: adminId, siteId: site.id, email: email.data, displayName: values['admin-name']?.trim() || 'Site admin', role: 'admin', status: 'invited', createdAt: new Date() });
  const secret = await createOneTimeLink(adminId, 'invitation');
  const url = `${env().PUBLIC_URL}/invitation?token=${encodeURIComponent(secret)}`;
  try {
    await sendMail({ to: email.data, subject: 'You are invited to Rungbook', text: `A Rungbook site "${name}" was created with you as its admin.\n\nSet your password here (the link works once, within 7 days):\n\n${url}\n` });
  } catch {
    console.warn('The invitation e-mail could not be sent; hand over the link below instead.');
  }
  console.log(`site "${name}" (${code}) created with admin ${email.data}`);
  console.log(`invitation link: ${url}`);
} finally {
  await pool().end();
}
