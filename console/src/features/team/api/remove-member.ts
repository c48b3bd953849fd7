import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import { expectSuccess } from '@/lib/problem';

export function removeMember(teamId: string, userId: string) {
  return expectSuccess(apiClient.DELETE('/v1/teams/{teamId}/members/{userId}', { params: { path: { teamId, userId } } }));
}

export function useRemoveMember(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (userId: string) => removeMember(teamId, userId),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ['members', teamId] }),
        queryClient.invalidateQueries({ queryKey: ['audit-events', teamId] }),
      ]),
  });
}
