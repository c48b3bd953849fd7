// How numbers in results are printed: six significant digits, exponent form for very large or small
// magnitudes, p-values with a floor, and an en dash for a value the API left out (null).

const missing = '–';

export function formatNumber(value: number | null | undefined, significant = 6): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return missing;
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  if (magnitude >= 1e7 || magnitude < 1e-4) return value.toExponential(significant - 1);
  return Number(value.toPrecision(significant)).toString();
}

export function formatPValue(value: number | null | undefined): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return missing;
  if (value < 0.0001) return '< 0.0001';
  return value.toFixed(4);
}

export function formatInterval(interval: { lower: number; upper: number } | null | undefined): string {
  if (!interval) return missing;
  return `${formatNumber(interval.lower)} to ${formatNumber(interval.upper)}`;
}

export function formatLevel(level: number): string {
  return `${Number((level * 100).toPrecision(4))}%`;
}

/** "p < 0.0001" or "p = 0.0123", for p-values inside a sentence. */
export function pPhrase(value: number | null | undefined): string {
  const formatted = formatPValue(value);
  return formatted.startsWith('<') ? `p ${formatted}` : `p = ${formatted}`;
}
