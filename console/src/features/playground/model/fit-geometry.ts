// Turning a fit's answer into plottable points: the data on the model's scale (ln where the form takes
// logs), evenly spaced grid points for the confidence band, and thinning for very long series.

export type Form = 'lin-lin' | 'log-lin' | 'lin-log' | 'log-log';

export function predictorIsLogged(form: Form): boolean {
  return form === 'lin-log' || form === 'log-log';
}

export function responseIsLogged(form: Form): boolean {
  return form === 'log-lin' || form === 'log-log';
}

/** `count` evenly spaced values from min to max inclusive; a single value when min equals max. */
export function evenGrid(min: number, max: number, count: number): number[] {
  if (!(Number.isFinite(min) && Number.isFinite(max)) || count < 2 || min === max) return [min];
  const step = (max - min) / (count - 1);
  return Array.from({ length: count }, (_, index) => (index === count - 1 ? max : min + index * step));
}

/**
 * The predictor values that entered the fit, in row order: rows the API dropped for missing values
 * (0-based indices in `dropped`) are skipped, as the fit skipped them.
 */
export function usedValues(column: readonly unknown[], dropped: readonly number[]): number[] | null {
  const droppedRows = new Set(dropped);
  const values: number[] = [];
  for (const [row, value] of column.entries()) {
    if (droppedRows.has(row)) continue;
    if (typeof value !== 'number' || !Number.isFinite(value)) return null;
    values.push(value);
  }
  return values;
}

/** Every k-th index so that at most `limit` remain; SVG charts stay responsive on long series. */
export function thinnedIndices(length: number, limit: number): number[] {
  const stride = Math.max(1, Math.ceil(length / limit));
  const indices: number[] = [];
  for (let index = 0; index < length; index += stride) indices.push(index);
  return indices;
}
