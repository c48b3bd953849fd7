import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import { expectData } from '@/lib/problem';

export function getUsage(teamId: string, from: string, to: string, signal?: AbortSignal) {
  return expectData(
    apiClient.GET('/v1/usage', { params: { query: { from, to } }, headers: { 'X-Leastline-Team': teamId }, signal }),
  );
}

export function usageQueryOptions(teamId: string, from: string, to: string) {
  return queryOptions({
    queryKey: ['usage', teamId, 'report', from, to],
    queryFn: ({ signal }) => getUsage(teamId, from, to, signal),
    placeholderData: keepPreviousData,
  });
}

export function useUsage(teamId: string, from: string, to: string, enabled = true) {
  return useQuery({ ...usageQueryOptions(teamId, from, to), enabled });
}
