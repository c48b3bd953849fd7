import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import { expectData } from '@/lib/problem';

export function getTeam(teamId: string, signal?: AbortSignal) {
  return expectData(apiClient.GET('/v1/teams/{teamId}', { params: { path: { teamId } }, signal }));
}

export function teamQueryOptions(teamId: string) {
  return queryOptions({
    queryKey: ['teams', teamId],
    queryFn: ({ signal }) => getTeam(teamId, signal),
    retry: false,
  });
}

export function useTeam(teamId: string, enabled = true) {
  return useQuery({ ...teamQueryOptions(teamId), enabled });
}
