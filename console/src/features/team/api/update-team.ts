import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { components } from '@/lib/api-schema';
import { expectData } from '@/lib/problem';

export type TeamChanges = components['schemas']['UpdateTeamDto'];

export function updateTeam(teamId: string, body: TeamChanges) {
  return expectData(apiClient.PATCH('/v1/teams/{teamId}', { params: { path: { teamId } }, body }));
}

export function useUpdateTeam(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: TeamChanges) => updateTeam(teamId, body),
    onSuccess: (team) => {
      queryClient.setQueryData(['teams', teamId], team);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: ['teams'] }),
        queryClient.invalidateQueries({ queryKey: ['session'] }),
        queryClient.invalidateQueries({ queryKey: ['audit-events', teamId] }),
      ]);
    },
  });
}
