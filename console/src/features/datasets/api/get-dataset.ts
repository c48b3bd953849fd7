import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import { expectData } from '@/lib/problem';
import { teamHeader } from '@/features/datasets/api/team-header';

export function getDataset(teamId: string, datasetId: string, signal?: AbortSignal) {
  return expectData(
    apiClient.GET('/v1/datasets/{datasetId}', { params: { path: { datasetId } }, headers: teamHeader(teamId), signal }),
  );
}

export function datasetQueryOptions(teamId: string, datasetId: string) {
  return queryOptions({
    queryKey: ['datasets', teamId, 'detail', datasetId],
    queryFn: ({ signal }) => getDataset(teamId, datasetId, signal),
    // A dataset version never changes once stored.
    staleTime: Number.POSITIVE_INFINITY,
  });
}

export function useDataset(teamId: string, datasetId: string | null) {
  return useQuery({ ...datasetQueryOptions(teamId, datasetId ?? ''), enabled: datasetId !== null });
}
