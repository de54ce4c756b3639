// GET|POST /api/auth/* – next-auth's own sign-in, session and sign-out endpoints
import NextAuth from 'next-auth';
import type { NextRequest } from 'next/server';
import { authOptions } from '@/lib/auth/options';

type Ctx = { params: Promise<{ nextauth: string[] }> };
const handler = (req: NextRequest, ctx: Ctx) => NextAuth(req as never, ctx as never, authOptions());
export { handler as GET, handler as POST };
