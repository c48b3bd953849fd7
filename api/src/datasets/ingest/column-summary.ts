/**
 * Per-column summary shown after an upload: count of present values, missing, and for numeric columns the
 * mean, the sample standard deviation (n − 1 denominator) and the range. Two passes (mean, then centred
 * squares) keep the variance exact for data with a large offset, which one-pass sums do not.
 */
export interface ColumnSummary {
  count: number;
  missing: number;
  mean: number | null;
  standardDeviation: number | null;
  min: number | null;
  max: number | null;
}

export function summariseNumeric(values: Float64Array): ColumnSummary {
  let count = 0;
  let sum = 0;
  let min = Number.POSITIVE_INFINITY;
  let max = Number.NEGATIVE_INFINITY;
  for (let i = 0; i < values.length; i++) {
    const value = values[i] as number;
    if (Number.isNaN(value)) continue;
    count += 1;
    sum += value;
    if (value < min) min = value;
    if (value > max) max = value;
  }
  const missing = values.length - count;
  if (count === 0) return { count, missing, mean: null, standardDeviation: null, min: null, max: null };
  const mean = sum / count;
  let squares = 0;
  let correction = 0;
  for (let i = 0; i < values.length; i++) {
    const value = values[i] as number;
    if (Number.isNaN(value)) continue;
    const deviation = value - mean;
    squares += deviation * deviation;
    correction += deviation;
  }
  // Corrected two-pass formula (Chan, Golub and LeVeque 1983): removes the rounding left in the mean.
  const standardDeviation = count > 1 ? Math.sqrt((squares - (correction * correction) / count) / (count - 1)) : null;
  return { count, missing, mean, standardDeviation, min, max };
}

export function summariseText(values: (string | null)[]): ColumnSummary {
  let missing = 0;
  for (const value of values) if (value === null) missing += 1;
  return { count: values.length - missing, missing, mean: null, standardDeviation: null, min: null, max: null };
}
