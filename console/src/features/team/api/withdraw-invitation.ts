import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import { expectSuccess } from '@/lib/problem';

export function withdrawInvitation(teamId: string, invitationId: string) {
  return expectSuccess(
    apiClient.DELETE('/v1/teams/{teamId}/invitations/{invitationId}', { params: { path: { teamId, invitationId } } }),
  );
}

export function useWithdrawInvitation(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: string) => withdrawInvitation(teamId, invitationId),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ['invitations', teamId] }),
        queryClient.invalidateQueries({ queryKey: ['audit-events', teamId] }),
      ]),
  });
}
