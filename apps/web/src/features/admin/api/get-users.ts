import type { UserDto } from '@app/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { adminUserKeys } from './keys';

/** GET /api/admin/users?q= (admins only). */
export const getUsers = (q: string, signal?: AbortSignal) =>
  apiFetch<UserDto[]>('/admin/users', { query: { q: q.trim() }, signal });

export const usersQuery = (q: string) =>
  queryOptions({
    queryKey: adminUserKeys.list({ q: q.trim() }),
    queryFn: ({ signal }) => getUsers(q, signal),
    placeholderData: keepPreviousData,
  });

/** Users matching `q` (name or e-mail); keeps the last list on screen while a new search runs. */
export const useUsers = (q: string) => useQuery(usersQuery(q));
