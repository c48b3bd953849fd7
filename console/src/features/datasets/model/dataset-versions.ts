import type { components } from '@/lib/api-schema';

type Dataset = components['schemas']['DatasetDto'];

export type DatasetGroup = { name: string; versions: Dataset[] };

/**
 * Datasets grouped by name, newest version first in each group; groups in the order their newest
 * version was stored, most recent first.
 */
export function groupVersions(datasets: readonly Dataset[]): DatasetGroup[] {
  const groups = new Map<string, Dataset[]>();
  for (const dataset of datasets) {
    const versions = groups.get(dataset.name) ?? [];
    versions.push(dataset);
    groups.set(dataset.name, versions);
  }
  return [...groups.entries()]
    .map(([name, versions]) => ({ name, versions: [...versions].sort((first, second) => second.version - first.version) }))
    .sort((first, second) => newest(second) - newest(first));
}

function newest(group: DatasetGroup): number {
  return Math.max(...group.versions.map((dataset) => Date.parse(dataset.createdAt)));
}

const namePattern = /^[A-Za-z0-9][A-Za-z0-9._-]{0,119}$/;

export function isValidDatasetName(name: string): boolean {
  return namePattern.test(name);
}

/** A dataset name the API accepts, suggested from a file name: extension dropped, other characters as "-". */
export function nameFromFileName(fileName: string): string {
  const stem = fileName.replace(/\.[^.]*$/, '');
  const cleaned = stem
    .replace(/[^A-Za-z0-9._-]+/g, '-')
    .replace(/^[^A-Za-z0-9]+/, '')
    .replace(/-+$/, '')
    .slice(0, 120);
  return cleaned === '' ? 'dataset' : cleaned;
}

/**
 * The playground address for a first fit on a dataset: its first numeric column explained by the next
 * one, with per-row results so the fit can be plotted. Null when there are fewer than two numeric columns.
 */
export function playgroundSearch(dataset: Dataset): string | null {
  const numeric = dataset.columns.filter((column) => column.kind === 'numeric');
  const [response, predictor] = numeric;
  if (!response || !predictor) return null;
  const anyMissing = response.missing > 0 || predictor.missing > 0;
  const request = {
    data: { datasetId: dataset.id },
    model: { response: response.name, predictors: [predictor.name] },
    missingValues: anyMissing ? 'drop-rows' : 'reject',
    includeObservations: true,
  };
  return new URLSearchParams({ endpoint: 'fits', request: JSON.stringify(request) }).toString();
}
