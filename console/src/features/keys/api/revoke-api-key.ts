import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import { expectSuccess } from '@/lib/problem';

export function revokeApiKey(teamId: string, keyId: string) {
  return expectSuccess(apiClient.DELETE('/v1/teams/{teamId}/api-keys/{keyId}', { params: { path: { teamId, keyId } } }));
}

export function useRevokeApiKey(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (keyId: string) => revokeApiKey(teamId, keyId),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ['api-keys', teamId] }),
        queryClient.invalidateQueries({ queryKey: ['audit-events', teamId] }),
      ]),
  });
}
