import type { SessionDto, UserDto } from '@app/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch, setCsrfToken } from '@/lib/api-client';
import { authKeys } from './keys';

/** GET /api/auth/me; remembers the CSRF token it carries. */
export async function getSession(signal?: AbortSignal): Promise<SessionDto> {
  const session = await apiFetch<SessionDto>('/auth/me', { signal });
  setCsrfToken(session.csrfToken);
  return session;
}

export const sessionQuery = () =>
  queryOptions({
    queryKey: authKeys.session(),
    queryFn: ({ signal }) => getSession(signal),
    staleTime: 5 * 60_000,
  });

/** The current session query. */
export const useSession = () => useQuery(sessionQuery());

/** The signed-in person (null for a visitor, undefined while the first answer is awaited). */
export function useCurrentUser(): { user: UserDto | null | undefined; isPending: boolean } {
  const { data, isPending } = useSession();
  return { user: data ? data.user : isPending ? undefined : null, isPending };
}
