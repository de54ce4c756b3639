// The server's route helpers (lib/server/route.ts: `body()`, `query()`, `fromZodError`) are typed for
// classic zod, while a schema shared with the browser is zod/mini (lib/validation/zod-mini.ts). This
// hands a route that same schema behind a classic pipe — not a copy: the issues, paths and messages
// are the shared schema's. Server code only; browser code imports the shared schema itself.
import { z } from 'zod';
import type { $ZodType } from 'zod/v4/core';

export const forRoutes = <T extends $ZodType>(schema: T) => z.pipe(z.unknown(), schema);
