import { describe, expect, it } from 'vitest';
import type { components } from '@/lib/api-schema';
import { groupVersions, isValidDatasetName, nameFromFileName, playgroundSearch } from '@/features/datasets/model/dataset-versions';

type Dataset = components['schemas']['DatasetDto'];
type Column = components['schemas']['DatasetColumnDto'];

function column(name: string, kind: Column['kind'], missing = 0): Column {
  return { name, kind, count: 10 - missing, missing, mean: null, standardDeviation: null, min: null, max: null };
}

function dataset(name: string, version: number, createdAt: string, columns: Column[] = []): Dataset {
  return {
    id: `00000000-0000-4000-8000-${String(version).padStart(4, '0')}${name.length.toString().padStart(8, '0')}`,
    name,
    version,
    contentHash: 'ab'.repeat(32),
    rowCount: 10,
    byteSize: 160,
    source: 'csv',
    createdBy: null,
    createdAt,
    columns,
  };
}

describe('groupVersions', () => {
  it('groups by name with the newest version first and the most recently touched name first', () => {
    const groups = groupVersions([
      dataset('merchant-fees', 1, '2026-03-01T10:00:00Z'),
      dataset('card-spend', 1, '2026-03-02T10:00:00Z'),
      dataset('merchant-fees', 2, '2026-03-03T10:00:00Z'),
    ]);
    expect(groups.map((group) => group.name)).toEqual(['merchant-fees', 'card-spend']);
    expect(groups[0]?.versions.map((entry) => entry.version)).toEqual([2, 1]);
  });
});

describe('dataset names', () => {
  it('suggests a name the API pattern accepts from an awkward file name', () => {
    const suggested = nameFromFileName('  Q3 chargebacks (final).csv');
    expect(suggested).toBe('Q3-chargebacks-final');
    expect(isValidDatasetName(suggested)).toBe(true);
  });

  it('falls back to a plain name when nothing usable is left', () => {
    expect(nameFromFileName('...csv')).toBe('dataset');
  });

  it('rejects names that start with punctuation or are too long', () => {
    expect(isValidDatasetName('-fees')).toBe(false);
    expect(isValidDatasetName(`a${'b'.repeat(120)}`)).toBe(false);
    expect(isValidDatasetName(`a${'b'.repeat(119)}`)).toBe(true);
  });
});

describe('playgroundSearch', () => {
  it('prefills a fit of the first numeric column on the next one, naming the dataset by id', () => {
    const stored = dataset('merchant-fees', 3, '2026-03-01T10:00:00Z', [
      column('merchant', 'text'),
      column('chargeback_bps', 'numeric'),
      column('avg_ticket', 'numeric', 2),
      column('volume', 'numeric'),
    ]);
    const search = new URLSearchParams(playgroundSearch(stored) ?? '');
    expect(search.get('endpoint')).toBe('fits');
    expect(JSON.parse(search.get('request') ?? 'null')).toEqual({
      data: { datasetId: stored.id },
      model: { response: 'chargeback_bps', predictors: ['avg_ticket'] },
      missingValues: 'drop-rows',
      includeObservations: true,
    });
  });

  it('offers nothing with fewer than two numeric columns', () => {
    expect(playgroundSearch(dataset('only-one', 1, '2026-03-01T10:00:00Z', [column('x', 'numeric'), column('y', 'text')]))).toBeNull();
  });
});
