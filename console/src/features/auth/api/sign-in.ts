import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { components } from '@/lib/api-schema';
import { expectData } from '@/lib/problem';
import { sessionQueryKey } from '@/features/auth/api/get-session';

export type SignInInput = components['schemas']['SignInDto'];

export function signIn(body: SignInInput) {
  return expectData(apiClient.POST('/v1/session', { body }));
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (session) => {
      // Whatever was cached belonged to whoever was signed in before.
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== sessionQueryKey[0] });
      queryClient.setQueryData(sessionQueryKey, session);
    },
  });
}
