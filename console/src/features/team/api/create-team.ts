import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { components } from '@/lib/api-schema';
import { expectData } from '@/lib/problem';

export type NewTeam = components['schemas']['CreateTeamDto'];

export function createTeam(body: NewTeam) {
  return expectData(apiClient.POST('/v1/teams', { body }));
}

export function useCreateTeam() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createTeam,
    // The session lists memberships, so it changes with a new team too.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ['teams'] }),
        queryClient.invalidateQueries({ queryKey: ['session'] }),
      ]),
  });
}
