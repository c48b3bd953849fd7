import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import { expectData } from '@/lib/problem';

export function listTeams(signal?: AbortSignal) {
  return expectData(apiClient.GET('/v1/teams', { signal }));
}

export function teamsQueryOptions() {
  return queryOptions({
    queryKey: ['teams'],
    queryFn: ({ signal }) => listTeams(signal),
  });
}

export function useTeams() {
  return useQuery(teamsQueryOptions());
}
