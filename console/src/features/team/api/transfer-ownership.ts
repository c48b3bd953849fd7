import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import { expectSuccess } from '@/lib/problem';

export function transferOwnership(teamId: string, newOwnerUserId: string) {
  return expectSuccess(
    apiClient.POST('/v1/teams/{teamId}/ownership-transfer', { params: { path: { teamId } }, body: { newOwnerUserId } }),
  );
}

export function useTransferOwnership(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (newOwnerUserId: string) => transferOwnership(teamId, newOwnerUserId),
    // The caller's own role changes (owner to admin), so the team, the session and the members all change.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ['members', teamId] }),
        queryClient.invalidateQueries({ queryKey: ['teams'] }),
        queryClient.invalidateQueries({ queryKey: ['session'] }),
        queryClient.invalidateQueries({ queryKey: ['audit-events', teamId] }),
      ]),
  });
}
