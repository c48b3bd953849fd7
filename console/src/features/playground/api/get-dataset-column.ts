import { useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import { expectData } from '@/lib/problem';
import { authHeaders, type PlaygroundAuth } from '@/features/playground/api/playground-auth';

const pageSize = 1000;
/** Beyond this many rows the scatter is not drawn from a stored dataset; the residual plots still are. */
export const datasetPlotRowLimit = 20_000;

/** One column of a stored dataset, all rows, for plotting y against x when the fit named a dataset. */
export async function getDatasetColumn(datasetId: string, column: string, auth: PlaygroundAuth, signal?: AbortSignal) {
  const values: unknown[] = [];
  let total = Number.POSITIVE_INFINITY;
  for (let offset = 0; offset < total; offset += pageSize) {
    const page = await expectData(
      apiClient.GET('/v1/datasets/{datasetId}/rows', {
        params: { path: { datasetId }, query: { offset, limit: pageSize } },
        headers: authHeaders(auth),
        signal,
      }),
    );
    total = page.total;
    if (total > datasetPlotRowLimit) return null;
    const index = page.columns.indexOf(column);
    if (index < 0) return null;
    for (const row of page.rows) values.push(row[index] ?? null);
    if (page.rows.length === 0) break;
  }
  return values;
}

export function useDatasetColumn(datasetId: string | null, column: string | null, auth: PlaygroundAuth) {
  return useQuery({
    queryKey: ['datasets', datasetId, 'column', column],
    queryFn: ({ signal }) => getDatasetColumn(datasetId ?? '', column ?? '', auth, signal),
    enabled: datasetId !== null && column !== null,
    staleTime: Number.POSITIVE_INFINITY,
  });
}
