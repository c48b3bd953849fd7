import { useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import { expectData } from '@/lib/problem';
import { authHeaders, type PlaygroundAuth } from '@/features/playground/api/playground-auth';
import type { ResultPayload } from '@/features/playground/api/result-payload';

export async function getStoredResult(resultId: string, auth: PlaygroundAuth, signal?: AbortSignal): Promise<ResultPayload> {
  return expectData(
    apiClient.GET('/v1/results/{resultId}', { params: { path: { resultId } }, headers: authHeaders(auth), signal }),
  );
}

/** A stored result read back, e.g. when a history entry is restored. Results never change once stored. */
export function useStoredResult(resultId: string | null, auth: PlaygroundAuth) {
  return useQuery({
    queryKey: ['results', resultId],
    queryFn: ({ signal }) => getStoredResult(resultId ?? '', auth, signal),
    enabled: resultId !== null,
    staleTime: Number.POSITIVE_INFINITY,
  });
}
