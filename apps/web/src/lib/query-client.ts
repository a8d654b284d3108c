import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-client';

export interface QueryClientHooks {
  /** Called once per failed query or mutation that the server answered with 401. */
  onUnauthenticated?: (error: ApiError) => void;
}

const NO_RETRY_STATUSES = new Set([400, 401, 403, 404, 409, 410, 413, 415, 429]);

function shouldRetry(failureCount: number, error: unknown): boolean {
  if (error instanceof ApiError && NO_RETRY_STATUSES.has(error.status)) return false;
  return failureCount < 2;
}

/** The app's QueryClient: no retries on client errors, a minute of freshness, one 401 hook. */
export function createQueryClient(hooks: QueryClientHooks = {}): QueryClient {
  const handle = (error: unknown) => {
    if (error instanceof ApiError && error.status === 401) hooks.onUnauthenticated?.(error);
  };
  return new QueryClient({
    queryCache: new QueryCache({ onError: handle }),
    mutationCache: new MutationCache({ onError: handle }),
    defaultOptions: {
      queries: { retry: shouldRetry, staleTime: 60_000, refetchOnWindowFocus: false },
      mutations: { retry: false },
    },
  });
}
