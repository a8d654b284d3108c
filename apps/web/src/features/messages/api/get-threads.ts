import type { ThreadSummaryDto } from '@app/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { threadKeys } from './keys';

/** GET /api/threads: the member's conversations as buyer or seller. */
export const getThreads = (signal?: AbortSignal) =>
  apiFetch<ThreadSummaryDto[]>('/threads', { signal });

export const threadsQuery = () =>
  queryOptions({ queryKey: threadKeys.list(), queryFn: ({ signal }) => getThreads(signal) });

/** The inbox. */
export const useThreads = () => useQuery(threadsQuery());
