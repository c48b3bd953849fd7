import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import { expectData } from '@/lib/problem';
import { teamHeader } from '@/features/datasets/api/team-header';

const pageSize = 100;

export function listDatasets(teamId: string, cursor: string | undefined, signal?: AbortSignal) {
  return expectData(
    apiClient.GET('/v1/datasets', {
      params: { query: { limit: pageSize, ...(cursor ? { cursor } : {}) } },
      headers: teamHeader(teamId),
      signal,
    }),
  );
}

export function datasetsQueryOptions(teamId: string) {
  return infiniteQueryOptions({
    queryKey: ['datasets', teamId, 'list'],
    queryFn: ({ pageParam, signal }) => listDatasets(teamId, pageParam, signal),
    initialPageParam: undefined as string | undefined,
    getNextPageParam: (page) => page.nextCursor ?? undefined,
  });
}

export function useDatasets(teamId: string, enabled = true) {
  return useInfiniteQuery({ ...datasetsQueryOptions(teamId), enabled });
}
