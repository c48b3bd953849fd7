import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import { expectData } from '@/lib/problem';

export function listApiKeys(teamId: string, signal?: AbortSignal) {
  return expectData(apiClient.GET('/v1/teams/{teamId}/api-keys', { params: { path: { teamId } }, signal }));
}

export function apiKeysQueryOptions(teamId: string) {
  return queryOptions({
    queryKey: ['api-keys', teamId],
    queryFn: ({ signal }) => listApiKeys(teamId, signal),
  });
}

export function useApiKeys(teamId: string, enabled = true) {
  return useQuery({ ...apiKeysQueryOptions(teamId), enabled });
}
