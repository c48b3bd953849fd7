/**
 * Consistency checks: exact invariances of least squares, applied to the engine.
 *
 * With an intercept, shifting the response by a constant or a predictor by a constant leaves the
 * residuals, the leverages and the column span of every auxiliary regression unchanged, and scaling the
 * response or a predictor by c scales the residuals (by c) or that predictor's slope (by 1/c). So every
 * assumption-check statistic (RESET, Breusch-Pagan in both variants, White, Durbin-Watson,
 * Breusch-Godfrey, Jarque-Bera) and every VIF is unchanged, with the same degrees of freedom; the slopes'
 * standard errors are unchanged, times c for a response scaling, or divided by c for the scaled
 * predictor's slope, under every covariance type; and the standard errors of a prediction at the
 * correspondingly moved point are unchanged, times c for a response scaling. These are identities
 * of the mathematics, not approximations (source: the algebra above; the transformed datasets are exact,
 * see below), so the tolerance is 1e-12 relative: what a backward-stable computation in doubles leaves
 * on these well-conditioned invented datasets.
 *
 * The invented datasets are drawn from the seeded generator and rounded to a dyadic grid (responses to
 * multiples of 2^-10, predictors to 2^-12) so that every shift and scaling below is exact in doubles: the
 * transformed dataset is exactly the shifted or scaled one, and the invariance is exact. Each test first
 * asserts that exactness, so a failure is the engine's.
 */

import { analyseModel, predict } from './index';
import type { AnalysisInput, AnalysisResult, CovarianceOption, FitInput } from './index';
import { seededRandom } from './__fixtures__/seeded-random';

const TOLERANCE = 1e-12;

const onGrid = (value: number, bits: number) => Math.round(value * 2 ** bits) / 2 ** bits;

interface InventedDataset {
  label: string;
  columns: Record<string, Float64Array>;
  response: string;
  predictors: string[];
  weights?: string;
  points: number[][];
}

/** Invented series A: one predictor, heteroskedastic noise, 6 groups. */
function inventedSeriesA(): InventedDataset {
  const random = seededRandom(20261202);
  const n = 48;
  const x = Float64Array.from({ length: n }, (_, i) => onGrid(4 + 0.4 * i + 0.3 * random.uniform(), 12));
  const y = Float64Array.from(x, (value, i) => onGrid(6 + 1.25 * value + (0.4 + 0.03 * i) * random.normal(), 10));
  const group = Float64Array.from({ length: n }, (_, i) => 11 + (i % 6));
  return { label: 'invented series A (one predictor)', columns: { y, x, group }, response: 'y', predictors: ['x'], points: [[9.5], [30.25]] };
}

/** Invented series B: two predictors, a weighted fit (weights (k/4)^2), 5 groups. */
function inventedSeriesB(): InventedDataset {
  const random = seededRandom(20261203);
  const n = 40;
  const weight = Float64Array.from({ length: n }, () => ((2 + Math.floor(9 * random.uniform())) / 4) ** 2);
  const first = Float64Array.from({ length: n }, () => onGrid(10 + 20 * random.uniform(), 12));
  const second = Float64Array.from({ length: n }, () => onGrid(0.5 + 0.5 * random.uniform(), 12));
  const y = Float64Array.from(
    { length: n },
    (_, i) => onGrid(2 + 0.3 * first[i]! - 1.5 * second[i]! + (0.5 / Math.sqrt(weight[i]!)) * random.normal(), 10),
  );
  const group = Float64Array.from({ length: n }, (_, i) => 1 + (i % 5));
  return {
    label: 'invented series B (two predictors, weighted)',
    columns: { y, first, second, weight, group },
    response: 'y',
    predictors: ['first', 'second'],
    weights: 'weight',
    points: [
      [18.5, 0.75],
      [42, 1.25],
    ],
  };
}

interface Transformation {
  label: string;
  /** The response, or the first predictor. */
  target: 'response' | 'predictor';
  apply: (value: number) => number;
  undo: (value: number) => number;
  /** Multiplier of the response (1 for shifts and predictor changes). */
  responseScale: number;
  /** Multiplier of the first predictor (1 for shifts and response changes). */
  predictorScale: number;
}

const shift = (target: Transformation['target'], amount: number, label: string): Transformation => ({
  label,
  target,
  apply: (value) => value + amount,
  undo: (value) => value - amount,
  responseScale: 1,
  predictorScale: 1,
});
const scaling = (target: Transformation['target'], power: number, label: string): Transformation => ({
  label,
  target,
  apply: (value) => value * 2 ** power,
  undo: (value) => value / 2 ** power,
  responseScale: target === 'response' ? 2 ** power : 1,
  predictorScale: target === 'predictor' ? 2 ** power : 1,
});

const TRANSFORMATIONS: Transformation[] = [
  shift('response', 1e6, 'y + 1e6'),
  shift('response', 1e9, 'y + 1e9'),
  shift('predictor', 1e8, 'x + 1e8'),
  scaling('response', 10, 'y * 2^10'),
  scaling('response', -20, 'y * 2^-20'),
  scaling('predictor', 10, 'x * 2^10'),
  scaling('predictor', -20, 'x * 2^-20'),
];

const COVARIANCES: CovarianceOption[] = [
  { type: 'classical' },
  { type: 'hc0' },
  { type: 'hc1' },
  { type: 'hc2' },
  { type: 'hc3' },
  { type: 'newey-west' },
  { type: 'cluster', groups: 'group' },
];

function transformed(dataset: InventedDataset, transformation: Transformation): InventedDataset {
  const name = transformation.target === 'response' ? dataset.response : dataset.predictors[0]!;
  return {
    ...dataset,
    columns: { ...dataset.columns, [name]: dataset.columns[name]!.map(transformation.apply) },
    points: transformation.target === 'predictor' ? dataset.points.map(([first, ...rest]) => [transformation.apply(first!), ...rest]) : dataset.points,
  };
}

function fitInput(dataset: InventedDataset): FitInput {
  return {
    columns: dataset.columns,
    response: dataset.response,
    predictors: dataset.predictors,
    ...(dataset.weights ? { weights: dataset.weights } : {}),
  };
}

/** Computed on first use (inside a test, so an engine error fails that test rather than the file). */
function lazy<T>(compute: () => T): () => T {
  let value: { result: T } | null = null;
  return () => (value ??= { result: compute() }).result;
}

const relativeDifference = (actual: number, expected: number) =>
  expected === 0 ? Math.abs(actual) : Math.abs(actual - expected) / Math.abs(expected);

/** Every statistic of the checks as `name -> { statistic, degrees of freedom }`, failing on a check not computed. */
function checkStatistics(dataset: InventedDataset): Record<string, { statistic: number; degreesOfFreedom: string }> {
  const input: AnalysisInput = fitInput(dataset);
  const all = analyseModel(input).diagnostics;
  const original = analyseModel({ ...input, diagnostics: ['breusch-pagan'], diagnosticOptions: { breuschPaganVariant: 'original' } })
    .diagnostics;
  const result: Record<string, { statistic: number; degreesOfFreedom: string }> = {};
  const entries = { ...all, breuschPaganOriginal: original.breuschPagan };
  for (const [name, entry] of Object.entries(entries)) {
    if (entry === undefined || entry.status !== 'computed') {
      result[name] = { statistic: Number.NaN, degreesOfFreedom: `not computed: ${entry?.status === 'not-defined' ? entry.message : 'missing'}` };
      continue;
    }
    if ('varianceInflation' in entry) {
      for (const row of entry.varianceInflation) result[`VIF ${row.term}`] = { statistic: row.varianceInflationFactor, degreesOfFreedom: '-' };
      continue;
    }
    result[name] = { statistic: entry.statistic, degreesOfFreedom: `${entry.degreesOfFreedom}/${entry.denominatorDegreesOfFreedom}` };
  }
  return result;
}

function slopeStandardErrors(dataset: InventedDataset): Record<string, number> {
  const result: Record<string, number> = {};
  for (const covariance of COVARIANCES) {
    const analysis: AnalysisResult = analyseModel({ ...fitInput(dataset), covariance, diagnostics: [] });
    for (const row of analysis.coefficients.slice(1)) result[`${covariance.type} ${row.term}`] = row.standardError;
  }
  return result;
}

function predictionStandardErrors(dataset: InventedDataset): Record<string, number> {
  const result: Record<string, number> = {};
  for (const covariance of [{ type: 'classical' }, { type: 'hc3' }] as CovarianceOption[]) {
    predict({ ...fitInput(dataset), points: dataset.points, covariance }).predictions.forEach((prediction, k) => {
      result[`${covariance.type} point ${k} mean`] = prediction.modelScale.standardErrorOfMean;
      result[`${covariance.type} point ${k} prediction`] = prediction.modelScale.standardErrorOfPrediction;
    });
  }
  return result;
}

function mismatches(base: Record<string, number>, moved: Record<string, number>, expectedFactor: (key: string) => number): string[] {
  return Object.keys(base).flatMap((key) => {
    const expected = base[key]! * expectedFactor(key);
    const actual = moved[key];
    if (actual === undefined) return [`${key}: missing after the transformation`];
    const difference = relativeDifference(actual, expected);
    return difference <= TOLERANCE ? [] : [`${key}: expected ${expected}, got ${actual} (relative difference ${difference.toExponential(2)})`];
  });
}

describe.each([inventedSeriesA(), inventedSeriesB()])('consistency checks on $label', (dataset) => {
  const firstPredictor = dataset.predictors[0]!;
  const baseChecks = lazy(() => checkStatistics(dataset));
  const baseStandardErrors = lazy(() => slopeStandardErrors(dataset));
  const basePredictions = lazy(() => predictionStandardErrors(dataset));

  it('every check is computed on the untransformed data', () => {
    expect(Object.entries(baseChecks()).filter(([, entry]) => !Number.isFinite(entry.statistic))).toEqual([]);
  });

  describe.each(TRANSFORMATIONS)('$label', (transformation) => {
    const moved = transformed(dataset, transformation);
    const name = transformation.target === 'response' ? dataset.response : firstPredictor;

    it('consistency check: the transformed column is exactly the shifted or scaled one (so the invariance is exact)', () => {
      const original = dataset.columns[name]!;
      const changed = moved.columns[name]!;
      const inexact = Array.from(changed).filter((value, i) => transformation.undo(value) !== original[i] || transformation.apply(original[i]!) !== value);
      expect(inexact).toEqual([]);
    });

    it('consistency check: every check statistic and VIF is unchanged (1e-12 relative) and keeps its degrees of freedom', () => {
      const before = baseChecks();
      const after = checkStatistics(moved);
      const statistics = (entries: typeof after) => Object.fromEntries(Object.entries(entries).map(([key, entry]) => [key, entry.statistic]));
      const changedDegreesOfFreedom = Object.keys(before)
        .filter((key) => after[key]?.degreesOfFreedom !== before[key]!.degreesOfFreedom)
        .map((key) => `${key}: degrees of freedom ${before[key]!.degreesOfFreedom} before, ${after[key]?.degreesOfFreedom ?? 'missing'} after`);
      expect([...mismatches(statistics(before), statistics(after), () => 1), ...changedDegreesOfFreedom]).toEqual([]);
    });

    it('consistency check: the slopes\' standard errors under every covariance type change exactly by the scaling (1e-12 relative)', () => {
      const factor = (key: string) => transformation.responseScale / (key.endsWith(` ${firstPredictor}`) ? transformation.predictorScale : 1);
      expect(mismatches(baseStandardErrors(), slopeStandardErrors(moved), factor)).toEqual([]);
    });

    it('consistency check: prediction standard errors at the correspondingly moved points change exactly by the response scaling (1e-12 relative)', () => {
      expect(mismatches(basePredictions(), predictionStandardErrors(moved), () => transformation.responseScale)).toEqual([]);
    });
  });
});
