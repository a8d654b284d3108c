import type { QueryClient } from '@tanstack/react-query';
import { authKeys } from '@/features/auth/api/keys';
import { createQueryClient } from '@/lib/query-client';
import { seedFromPage } from './boot-data';

/**
 * A QueryClient whose 401 answers make the session be fetched again (so the header and guards follow), seeded
 * with what the page already tells (boot-data.ts).
 */
export function createAppQueryClient(): QueryClient {
  const queryClient: QueryClient = createQueryClient({
    onUnauthenticated: () => void queryClient.invalidateQueries({ queryKey: authKeys.session() }),
  });
  seedFromPage(queryClient);
  return queryClient;
}
