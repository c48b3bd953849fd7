import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { components } from '@/lib/api-schema';
import { expectData } from '@/lib/problem';
import { sessionQueryKey } from '@/features/auth/api/get-session';

export type InvitationAcceptance = components['schemas']['AcceptInvitationDto'];

export function acceptInvitation(body: InvitationAcceptance) {
  return expectData(apiClient.POST('/v1/invitations/acceptance', { body }));
}

export function useAcceptInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptInvitation,
    // A new membership, and possibly a new account signed in by the answer's cookie.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: sessionQueryKey }),
  });
}
