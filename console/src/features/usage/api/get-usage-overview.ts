import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import { expectData } from '@/lib/problem';

export function getUsageOverview(teamId: string, signal?: AbortSignal) {
  return expectData(apiClient.GET('/v1/usage/overview', { headers: { 'X-Leastline-Team': teamId }, signal }));
}

export function usageOverviewQueryOptions(teamId: string) {
  return queryOptions({
    queryKey: ['usage', teamId, 'overview'],
    queryFn: ({ signal }) => getUsageOverview(teamId, signal),
  });
}

export function useUsageOverview(teamId: string, enabled = true) {
  return useQuery({ ...usageOverviewQueryOptions(teamId), enabled });
}
