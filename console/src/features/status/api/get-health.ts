import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';

export type HealthState = { reachable: true; checkedAt: number };

// Any 2xx counts as "up": the body may grow, but reachability is all the shell shows.
export async function getHealth(signal?: AbortSignal): Promise<HealthState> {
  const { response } = await apiClient.GET('/v1/health', { signal });
  if (!response.ok) {
    throw new Error(`Health check answered ${response.status}`);
  }
  return { reachable: true, checkedAt: Date.now() };
}

export function healthQueryOptions() {
  return queryOptions({
    queryKey: ['health'],
    queryFn: ({ signal }) => getHealth(signal),
    refetchInterval: 30_000,
    retry: false,
    staleTime: 10_000,
  });
}

export function useHealth() {
  return useQuery(healthQueryOptions());
}
