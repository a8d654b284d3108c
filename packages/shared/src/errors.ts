/** Closed set of error codes the API returns, with their HTTP status. */
export const STATUS_BY_CODE = {
  VALIDATION_FAILED: 400,
  UNAUTHENTICATED: 401,
  EMAIL_NOT_VERIFIED: 403,
  FORBIDDEN: 403,
  CSRF_INVALID: 403,
  NOT_FOUND: 404,
  CONFLICT: 409,
  GONE: 410,
  PAYLOAD_TOO_LARGE: 413,
  UNSUPPORTED_MEDIA: 415,
  RATE_LIMITED: 429,
  INTERNAL: 500,
  DB_UNAVAILABLE: 503,
  UPSTREAM_UNAVAILABLE: 503,
} as const;
export type ErrorCode = keyof typeof STATUS_BY_CODE;

/** Every error body: `{ error: { code, message, fields? } }`; `fields` maps a field path (a.b.0) to its message. */
export interface ErrorBody {
  error: { code: ErrorCode; message: string; fields?: Record<string, string> };
}

/** Success bodies: `{ data }` or `{ data, meta }`. */
export interface DataBody<T> {
  data: T;
}
export interface PageMeta {
  page: number;
  pageSize: number;
  total: number;
}
