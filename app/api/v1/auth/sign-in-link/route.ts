// POST /api/v1/auth/sign-in-link – e-mail a one-time sign-in link to an active account
import { eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { users } from '@/db/schema';
import { createOneTimeLink, LINK_LIFETIME_MINUTES } from '@/lib/auth/links';
import { SIGN_IN_WINDOW_SECONDS } from '@/lib/auth/options';
import { env } from '@/lib/env';
import { sendMail } from '@/lib/mail/send-mail';
import { enforceRateLimit } from '@/lib/server/rate-limit';
import { route } from '@/lib/server/route';
import { signInLinkSchema } from '@/lib/validation/auth';

export const POST = route({ public: true }, async ({ body, req }) => {
  const { email } = await body(signInLinkSchema);
  const ip = req.headers.get('x-forwarded-for')?.split(',')[0]?.trim() || 'local';
  await enforceRateLimit(`sign-in:email:${email}`, env().RATE_LIMIT_SIGN_IN, SIGN_IN_WINDOW_SECONDS);
  await enforceRateLimit(`sign-in:ip:${ip}`, env().RATE_LIMIT_SIGN_IN_IP, SIGN_IN_WINDOW_SECONDS);
  const [user] = await db().select().from(users).where(eq(users.email, email));
  if (user?.status === 'active') {
    const secret = await createOneTimeLink(user.id, 'sign_in');
    const url = `${env().PUBLIC_URL}/sign-in/link?token=${encodeURIComponent(secret)}`;
    await sendMail({
      to: user.email,
      subject: 'Your Rungbook sign-in link',
      text: `Open this link to sign in to Rungbook. It works once, within ${LINK_LIFETIME_MINUTES.sign_in} minutes:\n\n${url}\n\nIf you did not ask for it, ignore this e-mail.`,
    });
  }
  // The same answer whether or not the address has an account.
  return { ok: true, message: 'If that address belongs to an active account, a sign-in link is on its way.' };
});
