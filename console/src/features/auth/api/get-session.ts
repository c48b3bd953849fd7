import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { components } from '@/lib/api-schema';
import { problemFromResponse } from '@/lib/problem';

export type Session = components['schemas']['SessionDto'];

/** The signed-in account and its teams, or null when nobody is signed in. */
export async function getSession(signal?: AbortSignal): Promise<Session | null> {
  const { data, error, response } = await apiClient.GET('/v1/session', { signal });
  if (response.status === 401) return null;
  if (!response.ok || data === undefined) throw problemFromResponse(error, response);
  return data;
}

export const sessionQueryKey = ['session'] as const;

export function sessionQueryOptions() {
  return queryOptions({
    queryKey: sessionQueryKey,
    queryFn: ({ signal }) => getSession(signal),
    staleTime: 60_000,
  });
}

export function useSession() {
  return useQuery(sessionQueryOptions());
}
