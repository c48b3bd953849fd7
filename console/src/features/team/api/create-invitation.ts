import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { components } from '@/lib/api-schema';
import { expectData } from '@/lib/problem';

export type NewInvitation = components['schemas']['CreateInvitationDto'];

/** Also resends: a new invitation to the same address replaces the open one with a fresh link. */
export function createInvitation(teamId: string, body: NewInvitation) {
  return expectData(apiClient.POST('/v1/teams/{teamId}/invitations', { params: { path: { teamId } }, body }));
}

export function useCreateInvitation(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: NewInvitation) => createInvitation(teamId, body),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ['invitations', teamId] }),
        queryClient.invalidateQueries({ queryKey: ['audit-events', teamId] }),
      ]),
  });
}
