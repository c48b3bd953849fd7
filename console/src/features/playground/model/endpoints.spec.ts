import { describe, expect, it } from 'vitest';
import { endpointOrder, endpoints, formatRequest } from '@/features/playground/model/endpoints';

describe('sample requests', () => {
  it('are the same on every call, since they come from a seeded generator', () => {
    for (const id of endpointOrder) expect(JSON.stringify(endpoints[id].sample())).toBe(JSON.stringify(endpoints[id].sample()));
  });

  it('give every column of a sample the same length', () => {
    for (const id of endpointOrder) {
      const sample = endpoints[id].sample() as { data: { columns: Record<string, unknown[]> } };
      const lengths = new Set(Object.values(sample.data.columns).map((column) => column.length));
      expect(lengths.size).toBe(1);
    }
  });

  it('keep positive values where the form comparison takes logs', () => {
    const sample = endpoints['form-comparisons'].sample() as { data: { columns: Record<string, number[]> } };
    for (const column of Object.values(sample.data.columns)) expect(Math.min(...column)).toBeGreaterThan(0);
  });
});

describe('formatRequest', () => {
  it('puts number arrays on one line and still parses back to the same value', () => {
    const value = { points: [[40], [95.5]], data: { columns: { x: [1, -2.5, 3e-7] } }, model: { predictors: ['x'] } };
    const text = formatRequest(value);
    expect(text).toContain('"x": [1, -2.5, 3e-7]');
    expect(JSON.parse(text)).toEqual(value);
  });
});
