import { ZodError } from 'zod';

// One error type for the whole server side; the code decides the HTTP status.
export const ERROR_STATUS = {
  bad_request: 400,
  malformed_json: 400,
  unauthenticated: 401,
  token_revoked: 401,
  forbidden: 403,
  cross_origin: 403,
  not_found: 404,
  conflict: 409,
  gone: 410,
  payload_too_large: 413,
  unsupported_media_type: 415,
  validation: 422,
  upgrade_required: 426,
  rate_limited: 429,
  unavailable: 503,
} as const;
export type ErrorCode = keyof typeof ERROR_STATUS;

export interface FieldIssue {
  field: string;
  message: string;
}

export class AppError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly details?: { fields?: FieldIssue[]; [key: string]: unknown },
  ) {
    super(message);
    this.name = 'AppError';
  }
  get status(): number {
    return ERROR_STATUS[this.code];
  }
}

/** A ZodError becomes 422 naming every failing field (`rows.3.value`, `email`, …). */
export function fromZodError(error: ZodError, prefix = ''): AppError {
  const fields = error.issues.map((i) => ({
    field: [prefix, ...i.path.map(String)].filter(Boolean).join('.') || '(body)',
    message: i.message,
  }));
  const named = fields.map((f) => `${f.field}: ${f.message}`).join('; ');
  return new AppError('validation', `Invalid input — ${named}`, { fields });
}
