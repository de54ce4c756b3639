import 'server-only';
import pino from 'pino';
import { env } from '@/lib/env';

function level(): string {
  try {
    return env().LOG_LEVEL;
  } catch {
    return 'info'; // a broken configuration must still be logged
  }
}

const g = globalThis as unknown as { rungbookLog?: pino.Logger };
export const log: pino.Logger = (g.rungbookLog ??= pino({
  level: level(),
  base: { app: 'rungbook' },
  redact: ['req.headers.authorization', 'req.headers.cookie', '*.password', '*.token'],
}));
