import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import { expectData } from '@/lib/problem';

// A POST that changes nothing: the token travels in the body so it never lands in an access log.
export function previewInvitation(token: string, signal?: AbortSignal) {
  return expectData(apiClient.POST('/v1/invitations/preview', { body: { token }, signal }));
}

export function invitationPreviewQueryOptions(token: string) {
  return queryOptions({
    queryKey: ['invitations', 'preview', token],
    queryFn: ({ signal }) => previewInvitation(token, signal),
    enabled: token !== '',
    retry: false,
    staleTime: Infinity,
  });
}

export function useInvitationPreview(token: string) {
  return useQuery(invitationPreviewQueryOptions(token));
}
