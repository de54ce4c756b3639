import 'server-only';
import { and, eq, isNull } from 'drizzle-orm';
import { type NextRequest, NextResponse } from 'next/server';
import { ZodError, type z } from 'zod';
import { db } from '@/db/client';
import { apiTokens, users } from '@/db/schema';
import { currentUser } from '@/lib/auth/current';
import { can, type Permission } from '@/lib/auth/permissions';
import { env } from '@/lib/env';
import type { Actor } from './actor';
import { AppError, fromZodError } from './errors';
import { log } from './log';
import { enforceRateLimit } from './rate-limit';
import { hashSecret } from './secrets';

type Params = Record<string, string | string[] | undefined>;

export interface RouteContext<A extends Actor | null> {
  req: NextRequest;
  params: Params;
  actor: A;
  /** Parse the JSON body with a zod schema: malformed JSON → 400, a failing field → 422. */
  body<S extends z.ZodType>(schema: S): Promise<z.infer<S>>;
  /** Parse the query string with a zod schema. */
  query<S extends z.ZodType>(schema: S): z.infer<S>;
}

interface RouteOptions {
  /** The permission needed; omit together with `public: true` for sign-in style endpoints. */
  requires?: Permission;
  public?: boolean;
  /** Accept a site API token (`Authorization: Bearer rbt_…`) as well as a session. */
  tokens?: boolean;
  /** Let a mutation carry something other than JSON (e.g. a photo upload). */
  anyContentType?: boolean;
}

type Handler<A extends Actor | null> = (ctx: RouteContext<A>) => Promise<Response | unknown>;

const MUTATING = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

export function route(options: RouteOptions & { public: true }, handler: Handler<Actor | null>): (req: NextRequest, ctx: { params: Promise<Params> }) => Promise<Response>;
export function route(options: RouteOptions & { requires: Permission }, handler: Handler<Actor>): (req: NextRequest, ctx: { params: Promise<Params> }) => Promise<Response>;
/** The one wrapper for every route handler: auth, permission, site scoping, CSRF, errors. */
export function route(options: RouteOptions, handler: Handler<never>) {
  return async (req: NextRequest, routeCtx: { params: Promise<Params> }): Promise<Response> => {
    try {
      const bearer = req.headers.get('authorization');
      const actor: Actor | null = bearer ? await actorFromToken(bearer, options) : await currentUser();
      if (MUTATING.has(req.method) && !bearer) checkBrowserMutation(req, options);
      if (!options.public) {
        if (!actor) throw new AppError('unauthenticated', 'Sign in first.');
        if (options.requires && !can(actor.role, options.requires)) {
          throw new AppError('forbidden', `Your role (${actor.role}) may not do this (needs ${options.requires}).`);
        }
      }
      const ctx: RouteContext<Actor | null> = {
        req,
        params: (await routeCtx.params) ?? {},
        actor,
        body: async (schema) => {
          let raw: unknown;
          try {
            raw = await req.json();
          } catch {
            throw new AppError('malformed_json', 'The request body is not valid JSON.');
          }
          const parsed = schema.safeParse(raw);
          if (!parsed.success) throw fromZodError(parsed.error);
          return parsed.data;
        },
        query: (schema) => {
          const parsed = schema.safeParse(Object.fromEntries(req.nextUrl.searchParams));
          if (!parsed.success) throw fromZodError(parsed.error);
          return parsed.data;
        },
      };
      const result = await (handler as Handler<Actor | null>)(ctx);
      if (result instanceof Response) return result;
      return NextResponse.json(result ?? { ok: true });
    } catch (error) {
      return errorResponse(error, req);
    }
  };
}

export function errorResponse(error: unknown, req?: NextRequest): Response {
  if (error instanceof ZodError) error = fromZodError(error);
  if (error instanceof AppError) {
    const headers: Record<string, string> = {};
    if (error.code === 'rate_limited' && typeof error.details?.retryAfter === 'number') headers['Retry-After'] = String(error.details.retryAfter);
    return NextResponse.json({ error: { code: error.code, message: error.message, ...error.details } }, { status: error.status, headers });
  }
  log.error({ err: error, path: req?.nextUrl.pathname, method: req?.method }, 'unhandled error in route handler');
  return NextResponse.json({ error: { code: 'internal', message: 'Something went wrong on the server. It has been logged.' } }, { status: 500 });
}

/** Cookie-authenticated mutations must come from our own pages, as JSON (next-auth's CSRF token covers only its own routes). */
function checkBrowserMutation(req: NextRequest, options: RouteOptions) {
  const origin = req.headers.get('origin');
  const allowed = new Set([new URL(env().PUBLIC_URL).origin, `${req.nextUrl.protocol}//${req.headers.get('host')}`]);
  if (!origin || !allowed.has(origin)) throw new AppError('cross_origin', 'Refused: this request did not come from a Rungbook page (Origin header).');
  const type = req.headers.get('content-type') ?? '';
  if (!options.anyContentType && !type.toLowerCase().startsWith('application/json')) {
    throw new AppError('unsupported_media_type', 'Send the body as JSON (Content-Type: application/json).');
  }
}

async function actorFromToken(header: string, options: RouteOptions): Promise<Actor> {
  const match = /^Bearer\s+(\S+)$/i.exec(header);
  if (!match?.[1]) throw new AppError('unauthenticated', 'The Authorization header must be "Bearer <token>".');
  if (!options.tokens && !options.public) throw new AppError('forbidden', 'This endpoint does not accept API tokens; sign in instead.');
  const [row] = await db().select().from(apiTokens).where(eq(apiTokens.tokenHash, hashSecret(match[1])));
  if (!row) throw new AppError('unauthenticated', 'Unknown API token.');
  if (row.revokedAt) throw new AppError('token_revoked', 'This API token has been revoked.');
  await enforceRateLimit(`token:${row.id}`, env().RATE_LIMIT_TOKEN, 60);
  // "Last used" to the minute is enough: a busy feed must not write the token row on every call.
  if (!row.lastUsedAt || Date.now() - row.lastUsedAt.getTime() > 60_000) {
    await db().update(apiTokens).set({ lastUsedAt: new Date() }).where(and(eq(apiTokens.id, row.id), isNull(apiTokens.revokedAt)));
  }
  return { kind: 'token', tokenId: row.id, siteId: row.siteId, role: row.role, name: row.name };
}

/** The user row for an actor that must be a person (e.g. to author something). */
export async function requireUserActor(actor: Actor) {
  if (actor.kind !== 'user') throw new AppError('forbidden', 'Only a signed-in person can do this, not an API token.');
  const [row] = await db().select().from(users).where(eq(users.id, actor.userId));
  if (!row) throw new AppError('unauthenticated', 'Sign in first.');
  return row;
}
