import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import { expectData } from '@/lib/problem';

// The key list names its creators by user id; the team's member list turns those into names. Same
// operation and cache key as the team page's member list, so the two share one request.
export function listKeyCreators(teamId: string, signal?: AbortSignal) {
  return expectData(apiClient.GET('/v1/teams/{teamId}/members', { params: { path: { teamId } }, signal }));
}

export function keyCreatorsQueryOptions(teamId: string) {
  return queryOptions({
    queryKey: ['members', teamId],
    queryFn: ({ signal }) => listKeyCreators(teamId, signal),
  });
}

export function useKeyCreators(teamId: string) {
  return useQuery(keyCreatorsQueryOptions(teamId));
}
