import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import { expectSuccess } from '@/lib/problem';
import { teamHeader } from '@/features/datasets/api/team-header';

export function deleteDataset(teamId: string, datasetId: string) {
  return expectSuccess(
    apiClient.DELETE('/v1/datasets/{datasetId}', { params: { path: { datasetId } }, headers: teamHeader(teamId) }),
  );
}

export function useDeleteDataset(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (datasetId: string) => deleteDataset(teamId, datasetId),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ['datasets', teamId, 'list'] }),
        queryClient.invalidateQueries({ queryKey: ['audit-events', teamId] }),
      ]),
  });
}
