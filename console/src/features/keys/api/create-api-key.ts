import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { components } from '@/lib/api-schema';
import { expectData } from '@/lib/problem';

export type NewApiKey = components['schemas']['CreateApiKeyDto'];
export type CreatedApiKey = components['schemas']['CreatedApiKeyDto'];

/** The answer is the only place the full key ever appears; it is not cached. */
export function createApiKey(teamId: string, body: NewApiKey) {
  return expectData(apiClient.POST('/v1/teams/{teamId}/api-keys', { params: { path: { teamId } }, body }));
}

export function useCreateApiKey(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: NewApiKey) => createApiKey(teamId, body),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ['api-keys', teamId] }),
        queryClient.invalidateQueries({ queryKey: ['audit-events', teamId] }),
      ]),
  });
}
