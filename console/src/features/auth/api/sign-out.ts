import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, csrfMiddleware } from '@/lib/api-client';
import { problemFromResponse } from '@/lib/problem';
import { sessionQueryKey } from '@/features/auth/api/get-session';

/** Ends the session on the server. An already expired session counts as signed out. */
export async function signOut(): Promise<void> {
  const { error, response } = await apiClient.DELETE('/v1/session');
  if (!response.ok && response.status !== 401) throw problemFromResponse(error, response);
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSuccess: () => {
      csrfMiddleware.forgetToken();
      queryClient.setQueryData(sessionQueryKey, null);
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== sessionQueryKey[0] });
    },
  });
}
