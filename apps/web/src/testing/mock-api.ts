import { vi } from 'vitest';

export interface MockRequest {
  method: string;
  /** Path with query, e.g. `/api/admin/users?q=kim`. */
  url: string;
  headers: Record<string, string>;
  body: unknown;
}

export interface MockReply {
  status?: number;
  body?: unknown;
}

export type MockHandler = (request: MockRequest) => MockReply | Promise<MockReply>;

/** `METHOD /path` (query ignored) → handler; an unknown route answers 404 NOT_FOUND. */
export type MockRoutes = Record<string, MockHandler>;

function headersOf(init: RequestInit | undefined): Record<string, string> {
  const headers = new Headers(init?.headers);
  const result: Record<string, string> = {};
  headers.forEach((value, key) => {
    result[key] = value;
  });
  return result;
}

/**
 * Replaces global fetch with a vi.fn that answers from `routes` and records every request.
 * Returns the mock and the list of requests seen, in order.
 */
export function mockApi(routes: MockRoutes) {
  const requests: MockRequest[] = [];
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = typeof input === 'string' ? input : input instanceof URL ? input.href : input.url;
    const method = init?.method ?? 'GET';
    const body = typeof init?.body === 'string' ? (JSON.parse(init.body) as unknown) : undefined;
    const request: MockRequest = { method, url, headers: headersOf(init), body };
    requests.push(request);
    const handler = routes[`${method} ${url.split('?')[0] ?? url}`];
    const reply = handler
      ? await handler(request)
      : {
          status: 404,
          body: { error: { code: 'NOT_FOUND', message: `No mock for ${method} ${url}` } },
        };
    return new Response(reply.body === undefined ? null : JSON.stringify(reply.body), {
      status: reply.status ?? 200,
      headers: { 'Content-Type': 'application/json' },
    });
  });
  vi.stubGlobal('fetch', fetchMock);
  return { fetchMock, requests };
}

/** An error reply in the API's shape. */
export function errorReply(
  status: number,
  code: string,
  message: string,
  fields?: Record<string, string>,
): MockReply {
  return { status, body: { error: { code, message, ...(fields ? { fields } : {}) } } };
}
