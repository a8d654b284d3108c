import type { ErrorBody, ErrorCode, SessionDto } from '@app/shared';
import { env } from '@/config/env';

/** Codes the server sends, plus two the client raises itself when no usable answer arrived. */
export type ClientErrorCode = ErrorCode | 'NETWORK_ERROR' | 'BAD_RESPONSE';

/** A failed API call: HTTP status (0 when the server was not reached), code, message and per-field messages. */
export class ApiError extends Error {
  override readonly name = 'ApiError';

  constructor(
    readonly status: number,
    readonly code: ClientErrorCode,
    message: string,
    readonly fields: Record<string, string> = {},
  ) {
    super(message);
  }
}

export type HttpMethod = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

export interface ApiFetchOptions {
  method?: HttpMethod;
  /** Sent as JSON. */
  body?: unknown;
  /** Appended as a query string; undefined and empty values are left out. */
  query?: Record<string, string | number | boolean | undefined>;
  signal?: AbortSignal;
}

const NETWORK_MESSAGE = "Can't reach Rodewise right now. Check your connection and try again.";
const BAD_RESPONSE_MESSAGE = 'The server sent an answer Rodewise could not read. Please try again.';
const SESSION_PATH = '/auth/me';

let csrfToken: string | null = null;

/** Remembers the CSRF token to send on every state-changing request (from `me`, login and logout). */
export function setCsrfToken(token: string | null): void {
  csrfToken = token;
}

/** The CSRF token currently held in memory, or null before the first session call. */
export function getCsrfToken(): string | null {
  return csrfToken;
}

/** Builds `/api/...?query` from a path relative to the API root. */
export function apiUrl(path: string, query?: ApiFetchOptions['query']): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query ?? {})) {
    if (value !== undefined && value !== '') params.set(key, String(value));
  }
  const search = params.toString();
  return `${env.apiBaseUrl}${path}${search ? `?${search}` : ''}`;
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null;
}

function toApiError(status: number, payload: unknown): ApiError {
  const error = isRecord(payload) ? payload.error : undefined;
  if (isRecord(error) && typeof error.code === 'string' && typeof error.message === 'string') {
    const body = error as ErrorBody['error'];
    return new ApiError(status, body.code, body.message, body.fields ?? {});
  }
  return new ApiError(status, 'BAD_RESPONSE', BAD_RESPONSE_MESSAGE);
}

async function readJson(response: Response): Promise<unknown> {
  if (response.status === 204) return undefined;
  const text = await response.text();
  if (text === '') return undefined;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    throw new ApiError(response.status, 'BAD_RESPONSE', BAD_RESPONSE_MESSAGE);
  }
}

async function send(path: string, options: ApiFetchOptions): Promise<Response> {
  const method = options.method ?? 'GET';
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (options.body !== undefined) headers['Content-Type'] = 'application/json';
  if (method !== 'GET' && csrfToken) headers['X-CSRF-Token'] = csrfToken;
  try {
    return await fetch(apiUrl(path, options.query), {
      method,
      headers,
      credentials: 'include',
      body: options.body === undefined ? undefined : JSON.stringify(options.body),
      signal: options.signal,
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError(0, 'NETWORK_ERROR', NETWORK_MESSAGE);
  }
}

async function parse<T>(response: Response): Promise<T> {
  const payload = await readJson(response);
  if (!response.ok) throw toApiError(response.status, payload);
  if (payload === undefined) return undefined as T;
  if (!isRecord(payload) || !('data' in payload)) {
    throw new ApiError(response.status, 'BAD_RESPONSE', BAD_RESPONSE_MESSAGE);
  }
  return payload.data as T;
}

/** Fetches a fresh session (and so a fresh CSRF token) after the server rejected the old token. */
async function refreshCsrfToken(signal?: AbortSignal): Promise<void> {
  const session = await parse<SessionDto>(await send(SESSION_PATH, { signal }));
  setCsrfToken(session.csrfToken);
}

/**
 * Calls the JSON API at `path` (relative to /api) and returns the body's `data`.
 * Sends cookies and, on writes, the CSRF token. When the server answers 403 CSRF_INVALID it
 * fetches a new token once and repeats the request once. Throws {@link ApiError} on any failure.
 */
export async function apiFetch<T>(path: string, options: ApiFetchOptions = {}): Promise<T> {
  const first = await send(path, options);
  const isWrite = (options.method ?? 'GET') !== 'GET';
  if (isWrite && first.status === 403) {
    const error = toApiError(first.status, await readJson(first));
    if (error.code !== 'CSRF_INVALID') throw error;
    await refreshCsrfToken(options.signal);
    return parse<T>(await send(path, options));
  }
  return parse<T>(first);
}
