import type { BoatDto } from '@app/shared';
import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { knowledgeKeys } from './keys';

/** GET /api/boats: the member's boat profiles, to attach one to a question. */
export const useMyBoats = (enabled: boolean) =>
  useQuery({
    queryKey: knowledgeKeys.boats(),
    queryFn: ({ signal }) => apiFetch<BoatDto[]>('/boats', { signal }),
    enabled,
  });
