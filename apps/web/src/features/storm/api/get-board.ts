import type { ReadinessDto, StormWatchDto } from '@app/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { stormKeys } from './keys';

export interface BoardDto {
  watch: StormWatchDto;
  rows: ReadinessDto[];
}

/** GET /api/storm-watches/:watchId/board, optionally for one harbour. */
export const getBoard = (watchId: number, harborId?: number, signal?: AbortSignal) =>
  apiFetch<BoardDto>(`/storm-watches/${watchId}/board`, { query: { harborId }, signal });

export const boardQuery = (watchId: number, harborId?: number) =>
  queryOptions({
    queryKey: stormKeys.board(watchId, harborId),
    queryFn: ({ signal }) => getBoard(watchId, harborId, signal),
  });

export const useBoard = (watchId: number, harborId?: number) =>
  useQuery(boardQuery(watchId, harborId));
