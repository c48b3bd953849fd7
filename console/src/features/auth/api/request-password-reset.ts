import { useMutation } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { components } from '@/lib/api-schema';
import { expectData } from '@/lib/problem';

export type PasswordResetRequest = components['schemas']['RequestPasswordResetDto'];

/** Always answers the same way, whether or not the address has an account. */
export function requestPasswordReset(body: PasswordResetRequest) {
  return expectData(apiClient.POST('/v1/password-resets', { body }));
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}
