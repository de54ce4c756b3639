import 'server-only';
import { eq } from 'drizzle-orm';
import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import { db } from '@/db/client';
import { users } from '@/db/schema';
import { env, isSecureUrl } from '@/lib/env';
import { AppError } from '@/lib/server/errors';
import { log } from '@/lib/server/log';
import { hitRateLimit } from '@/lib/server/rate-limit';
import { consumeOneTimeLink } from './links';
import { verifyPassword } from './passwords';

export const SIGN_IN_WINDOW_SECONDS = 15 * 60;
/** The one message for an unknown e-mail and a wrong password alike. */
export const GENERIC_SIGN_IN_ERROR = 'The e-mail or password is not right.';

type HeaderBag = Record<string, string | string[] | undefined> | undefined;
function clientIp(headers: HeaderBag): string {
  const fwd = headers?.['x-forwarded-for'];
  const first = (Array.isArray(fwd) ? fwd[0] : fwd)?.split(',')[0]?.trim();
  return first || 'local';
}

async function signedIn(userId: string) {
  await db().update(users).set({ lastSignInAt: new Date() }).where(eq(users.id, userId));
}

export function authOptions(): NextAuthOptions {
  return {
    secret: env().AUTH_SECRET,
    session: { strategy: 'jwt', maxAge: 12 * 60 * 60 },
    pages: { signIn: '/sign-in', error: '/sign-in' },
    useSecureCookies: isSecureUrl(),
    providers: [
      CredentialsProvider({
        id: 'password',
        name: 'E-mail and password',
        credentials: { email: { type: 'email' }, password: { type: 'password' } },
        async authorize(credentials, req) {
          const email = String(credentials?.email ?? '').trim().toLowerCase();
          const password = String(credentials?.password ?? '');
          const limit = env().RATE_LIMIT_SIGN_IN;
          // Every attempt counts, right or wrong, per e-mail and per client address.
          const byEmail = await hitRateLimit(`sign-in:email:${email}`, limit, SIGN_IN_WINDOW_SECONDS);
          const byIp = await hitRateLimit(`sign-in:ip:${clientIp(req?.headers)}`, env().RATE_LIMIT_SIGN_IN_IP, SIGN_IN_WINDOW_SECONDS);
          if (!byEmail.ok || !byIp.ok) throw new Error('rate_limited');
          const [user] = email ? await db().select().from(users).where(eq(users.email, email)) : [];
          const ok = await verifyPassword(user?.passwordHash ?? null, password);
          if (!user || !ok || user.status !== 'active') {
            log.info({ email }, 'sign-in refused');
            return null;
          }
          await signedIn(user.id);
          return { id: user.id, email: user.email, name: user.displayName };
        },
      }),
      CredentialsProvider({
        id: 'link',
        name: 'One-time link',
        credentials: { token: { type: 'text' } },
        async authorize(credentials) {
          try {
            const user = await consumeOneTimeLink(String(credentials?.token ?? ''), 'sign_in');
            if (user.status !== 'active') return null;
            await signedIn(user.id);
            return { id: user.id, email: user.email, name: user.displayName };
          } catch (error) {
            if (error instanceof AppError) throw new Error(error.message);
            throw error;
          }
        },
      }),
    ],
    callbacks: {
      async jwt({ token, user }) {
        if (user) {
          const [row] = await db().select().from(users).where(eq(users.id, user.id));
          if (row) {
            token.uid = row.id;
            token.siteId = row.siteId;
            token.role = row.role;
            token.sv = row.sessionVersion;
          }
        }
        return token;
      },
      async session({ session, token }) {
        session.user = {
          ...session.user,
          id: String(token.uid ?? ''),
          siteId: String(token.siteId ?? ''),
          role: (token.role as 'technician' | 'supervisor' | 'admin') ?? 'technician',
          sv: Number(token.sv ?? 0),
        };
        return session;
      },
    },
  };
}
