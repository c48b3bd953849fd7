import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import { expectData } from '@/lib/problem';

export function listInvitations(teamId: string, signal?: AbortSignal) {
  return expectData(apiClient.GET('/v1/teams/{teamId}/invitations', { params: { path: { teamId } }, signal }));
}

export function invitationsQueryOptions(teamId: string) {
  return queryOptions({
    queryKey: ['invitations', teamId],
    queryFn: ({ signal }) => listInvitations(teamId, signal),
  });
}

export function useInvitations(teamId: string, enabled = true) {
  return useQuery({ ...invitationsQueryOptions(teamId), enabled });
}
