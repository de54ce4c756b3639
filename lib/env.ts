import 'server-only';
import { z } from 'zod';

// The one place that reads process.env. Validated once, at first use.
const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  DATABASE_URL: z.string().startsWith('mysql://', 'DATABASE_URL must be a mysql:// URL'),
  AUTH_SECRET: z.string().min(16, 'AUTH_SECRET must be at least 16 characters'),
  PUBLIC_URL: z.url().default('http://127.0.0.1:3000'),
  SMTP_URL: z.string().default('smtp://127.0.0.1:2525'),
  MAIL_FROM: z.string().default('Rungbook <rungbook@localhost>'),
  MAIL_INBOX_URL: z.string().optional(),
  S3_ENDPOINT: z.string().optional(),
  S3_REGION: z.string().default('us-east-1'),
  S3_BUCKET: z.string().min(3).default('rungbook-photos'),
  S3_ACCESS_KEY_ID: z.string().default('S3RVER'),
  S3_SECRET_ACCESS_KEY: z.string().default('S3RVER'),
  S3_FORCE_PATH_STYLE: z.enum(['true', 'false']).default('true'),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  // Sign-in attempts per 15 minutes, per e-mail address and per client address.
  RATE_LIMIT_SIGN_IN: z.coerce.number().int().positive().default(10),
  RATE_LIMIT_SIGN_IN_IP: z.coerce.number().int().positive().default(50),
  RATE_LIMIT_TOKEN: z.coerce.number().int().positive().default(600),
});

export type Env = z.infer<typeof envSchema>;
let cached: Env | undefined;

export function env(): Env {
  if (!cached) {
    const parsed = envSchema.safeParse(process.env);
    if (!parsed.success) {
      const fields = parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ');
      throw new Error(`Rungbook is misconfigured: ${fields}`);
    }
    cached = parsed.data;
  }
  return cached;
}

export const isSecureUrl = () => env().PUBLIC_URL.startsWith('https://');
