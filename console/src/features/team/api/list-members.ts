import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import { expectData } from '@/lib/problem';

export function listMembers(teamId: string, signal?: AbortSignal) {
  return expectData(apiClient.GET('/v1/teams/{teamId}/members', { params: { path: { teamId } }, signal }));
}

export function membersQueryOptions(teamId: string) {
  return queryOptions({
    queryKey: ['members', teamId],
    queryFn: ({ signal }) => listMembers(teamId, signal),
  });
}

export function useMembers(teamId: string) {
  return useQuery(membersQueryOptions(teamId));
}
