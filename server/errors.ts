import 'server-only';

// One error class with a code; the status comes from one table.
export const ERROR_STATUS = {
  bad_request: 400,
  invalid_json: 400,
  validation_failed: 400,
  unauthorized: 401,
  invalid_credentials: 401,
  forbidden: 403,
  cross_site: 403,
  not_found: 404,
  conflict: 409,
  stale_version: 409,
  duplicate: 409,
  payload_too_large: 413,
  unsupported_media_type: 415,
  rule_violated: 422,
  scale_locked: 422,
  unstable: 422,
  over_capacity: 422,
  rate_limited: 429,
  internal: 500,
  unavailable: 503,
} as const;
export type ErrorCode = keyof typeof ERROR_STATUS;

export class AppError extends Error {
  readonly code: ErrorCode;
  readonly fields?: Record<string, string>;
  readonly headers?: Record<string, string>;

  constructor(code: ErrorCode, message: string, opts: { fields?: Record<string, string>; headers?: Record<string, string> } = {}) {
    super(message);
    this.code = code;
    this.fields = opts.fields;
    this.headers = opts.headers;
  }

  get status(): number {
    return ERROR_STATUS[this.code];
  }
}

export const notFound = (what: string): AppError => new AppError('not_found', `${what} was not found`);
