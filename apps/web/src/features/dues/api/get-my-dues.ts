import type { MyDuesDto } from '@app/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { duesKeys } from './keys';

/** GET /api/dues/me: membership, status, what is owed and recent payments. */
export const getMyDues = (signal?: AbortSignal) => apiFetch<MyDuesDto>('/dues/me', { signal });

export const myDuesQuery = () =>
  queryOptions({ queryKey: duesKeys.me(), queryFn: ({ signal }) => getMyDues(signal) });

/** The signed-in member's dues. */
export const useMyDues = () => useQuery(myDuesQuery());
