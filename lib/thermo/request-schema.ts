// The solve request schema as the server's HTTP routes take it. Their helpers (lib/server/route.ts,
// `fromZodError`) are written for classic zod, while the engine's own schema (schemas.ts) is zod/mini
// so the device need not load classic zod. This is that same schema behind a classic pipe — not a
// second copy: the issues, paths and messages are the engine schema's. Device code never imports it,
// so bundles leave it (and classic zod) out.
import { z } from 'zod';
import { solveRequestSchema as engineSolveRequestSchema } from './schemas';

export const solveRequestSchema = /* @__PURE__ */ z.pipe(z.unknown(), engineSolveRequestSchema);
