import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import { expectData } from '@/lib/problem';
import type { AssignableRole } from '@/lib/permissions';

export function changeMemberRole(teamId: string, userId: string, role: AssignableRole) {
  return expectData(
    apiClient.PATCH('/v1/teams/{teamId}/members/{userId}', { params: { path: { teamId, userId } }, body: { role } }),
  );
}

export function useChangeMemberRole(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: string; role: AssignableRole }) => changeMemberRole(teamId, userId, role),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ['members', teamId] }),
        queryClient.invalidateQueries({ queryKey: ['audit-events', teamId] }),
      ]),
  });
}
