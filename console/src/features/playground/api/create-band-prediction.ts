import { useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import { expectData } from '@/lib/problem';
import { authHeaders, type PlaygroundAuth } from '@/features/playground/api/playground-auth';

/**
 * Mean-response intervals along a grid of predictor values, from a stored one-predictor fit: the
 * confidence band drawn around the fitted line. This is a metered prediction call of its own.
 */
export function createBandPrediction(fitId: string, grid: number[], auth: PlaygroundAuth) {
  return expectData(
    apiClient.POST('/v1/predictions', {
      body: { fitId, points: grid.map((value) => [value]) },
      headers: authHeaders(auth),
    }),
  );
}

export function useBandPrediction(fitId: string | null, grid: number[], auth: PlaygroundAuth) {
  return useQuery({
    queryKey: ['results', fitId, 'band', grid.length, grid[0], grid[grid.length - 1]],
    queryFn: () => createBandPrediction(fitId ?? '', grid, auth),
    enabled: fitId !== null && grid.length > 1,
    staleTime: Number.POSITIVE_INFINITY,
    retry: false,
  });
}
