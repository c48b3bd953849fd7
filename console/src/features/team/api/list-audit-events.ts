import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { components } from '@/lib/api-schema';
import { expectData } from '@/lib/problem';

export type AuditAction = components['schemas']['AuditEventDto']['action'];

const pageSize = 25;

export function listAuditEvents(
  teamId: string,
  options: { cursor?: string | undefined; action?: AuditAction | undefined; signal?: AbortSignal },
) {
  return expectData(
    apiClient.GET('/v1/teams/{teamId}/audit-events', {
      params: {
        path: { teamId },
        query: { limit: pageSize, cursor: options.cursor, action: options.action },
      },
      signal: options.signal,
    }),
  );
}

// Pages follow the body's `nextCursor` (the same cursor the Link header carries).
export function auditEventsQueryOptions(teamId: string, action: AuditAction | undefined) {
  return infiniteQueryOptions({
    queryKey: ['audit-events', teamId, { action: action ?? null }],
    queryFn: ({ pageParam, signal }) => listAuditEvents(teamId, { cursor: pageParam, action, signal }),
    initialPageParam: undefined as string | undefined,
    getNextPageParam: (lastPage) => lastPage.nextCursor ?? undefined,
  });
}

export function useAuditEvents(teamId: string, action: AuditAction | undefined, enabled = true) {
  return useInfiniteQuery({ ...auditEventsQueryOptions(teamId, action), enabled });
}
