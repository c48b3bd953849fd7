import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import { expectData } from '@/lib/problem';

export function rotateApiKey(teamId: string, keyId: string, overlapHours: number) {
  return expectData(
    apiClient.POST('/v1/teams/{teamId}/api-keys/{keyId}/rotation', {
      params: { path: { teamId, keyId } },
      body: { overlapHours },
    }),
  );
}

export function useRotateApiKey(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ keyId, overlapHours }: { keyId: string; overlapHours: number }) =>
      rotateApiKey(teamId, keyId, overlapHours),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ['api-keys', teamId] }),
        queryClient.invalidateQueries({ queryKey: ['audit-events', teamId] }),
      ]),
  });
}
