import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import { expectData } from '@/lib/problem';
import { teamHeader } from '@/features/datasets/api/team-header';

export function getDatasetRows(teamId: string, datasetId: string, offset: number, limit: number, signal?: AbortSignal) {
  return expectData(
    apiClient.GET('/v1/datasets/{datasetId}/rows', {
      params: { path: { datasetId }, query: { offset, limit } },
      headers: teamHeader(teamId),
      signal,
    }),
  );
}

export function datasetRowsQueryOptions(teamId: string, datasetId: string, offset: number, limit: number) {
  return queryOptions({
    queryKey: ['datasets', teamId, 'rows', datasetId, offset, limit],
    queryFn: ({ signal }) => getDatasetRows(teamId, datasetId, offset, limit, signal),
    staleTime: Number.POSITIVE_INFINITY,
    placeholderData: keepPreviousData,
  });
}

export function useDatasetRows(teamId: string, datasetId: string, offset: number, limit: number) {
  return useQuery(datasetRowsQueryOptions(teamId, datasetId, offset, limit));
}
