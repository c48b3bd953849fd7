import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { components } from '@/lib/api-schema';
import { expectSuccess } from '@/lib/problem';
import { sessionQueryKey } from '@/features/auth/api/get-session';

export type PasswordResetCompletion = components['schemas']['CompletePasswordResetDto'];

export function completePasswordReset(body: PasswordResetCompletion) {
  return expectSuccess(apiClient.POST('/v1/password-resets/completion', { body }));
}

export function useCompletePasswordReset() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: completePasswordReset,
    // The API signs the account out everywhere, this browser included.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: sessionQueryKey }),
  });
}
