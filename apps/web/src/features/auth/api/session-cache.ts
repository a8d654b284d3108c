import type { SessionDto, UserDto } from '@app/shared';
import type { QueryClient } from '@tanstack/react-query';
import { setCsrfToken } from '@/lib/api-client';
import { authKeys } from './keys';

/**
 * Stores a new session after sign-in or sign-out: remembers its CSRF token, drops every other cached answer
 * (they belonged to the previous person) and puts the session in the cache.
 */
export function replaceSession(queryClient: QueryClient, session: SessionDto): void {
  setCsrfToken(session.csrfToken);
  queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== authKeys.all[0] });
  queryClient.setQueryData(authKeys.session(), session);
}

/** Puts an updated user into the cached session, keeping its CSRF token. */
export function updateSessionUser(queryClient: QueryClient, user: UserDto): void {
  queryClient.setQueryData<SessionDto>(authKeys.session(), (old) => (old ? { ...old, user } : old));
}
