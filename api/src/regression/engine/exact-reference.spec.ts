/**
 * The engine against an exact reference: every quantity below is compared with the values of
 * `__fixtures__/exact/*.json`, computed by `__fixtures__/exact/generate-exact-references.mjs` from the very
 * doubles this test sends, in exact rational arithmetic (square roots and distribution functions to
 * 100+ significant digits, printed to 25). Source of every expected value: "exact rational reference,
 * generate-exact-references.mjs". See the README in that folder.
 *
 * Tolerance: relative error |engine - reference| / |reference| <= 1e-10 for every quantity (absolute
 * error where the reference is 0). The inputs are exact doubles and the reference is exact, so nothing
 * but the engine's own arithmetic separates the two; no quantity here has a mathematical reason to be
 * less accurate (the fixtures avoid p-values whose condition number |s f(s) / P(s)| would turn the
 * statistic's last-bit rounding into more than 1e-12, and the automatic Newey-West lag is not near an
 * integer boundary). A check the engine reports as not defined, or a call that throws, fails the
 * quantity; the worst error per dataset and quantity is printed once, after all tests.
 */

import { readFileSync } from 'fs';
import { join } from 'path';
import { analyseModel, fitModel, predict } from './index';
import type { AnalysisInput, AnalysisResult, CovarianceOption, FitInput, FitResult } from './index';

const TOLERANCE = 1e-10;
const FIXTURE_FOLDER = join(__dirname, '__fixtures__', 'exact');
const DATASETS = [
  'offset-1e4',
  'offset-1e8',
  'offset-1e12',
  'epoch-seconds',
  'epoch-milliseconds',
  'price-level',
  'price-level-no-intercept',
  'polynomial-5',
  'longley',
  'weighted',
  'clustered',
] as const;

interface CheckReference {
  statistic: string;
  pValue: string;
  degreesOfFreedom: number;
  denominatorDegreesOfFreedom: number | null;
}
type WhiteReference = CheckReference | { notDefined: string } | { excluded: string };

interface PredictionReference {
  point: number[];
  estimate: string;
  standardErrorOfMean: string;
  standardErrorOfPrediction: string;
  confidenceInterval: [string, string];
  predictionInterval: [string, string];
}

interface Fixture {
  name: string;
  columns: Record<string, number[]>;
  response: string;
  predictors: string[];
  intercept: boolean;
  weights?: string;
  groups?: string;
  points: number[][];
  observationCount: number;
  reference: {
    coefficientCount: number;
    residualDegreesOfFreedom: number;
    coefficients: string[];
    classicalStandardErrors: string[];
    residualSumOfSquares: string;
    residualVariance: string;
    rSquared: string;
    rSquaredDefinition: 'centred' | 'uncentred';
    classicalInference: { tStatistics: string[]; pValues: string[] };
    hc3Inference: { tStatistics: string[]; pValues: string[] };
    standardErrors: {
      hc0: string[];
      hc1: string[];
      hc2: string[];
      hc3: string[];
      neweyWestAutomatic: { lag: number; standardErrors: string[] };
      neweyWestLag2: { lag: number; standardErrors: string[] };
      cluster?: { groupCount: number; degreesOfFreedom: number; standardErrors: string[] };
    };
    predictions: { studentCritical: string; classical: PredictionReference[]; hc3: PredictionReference[] };
    checks: {
      reset: CheckReference;
      breuschPaganStudentised: CheckReference;
      breuschPaganOriginal: CheckReference;
      white: WhiteReference;
      durbinWatson: { statistic: string };
      breuschGodfreyLm: CheckReference;
      breuschGodfreyF: CheckReference;
      jarqueBera: CheckReference;
    };
    varianceInflation: { term: string; value: string }[] | null;
  };
}

function loadFixture(name: string): Fixture {
  return JSON.parse(readFileSync(join(FIXTURE_FOLDER, `${name}.json`), 'utf8')) as Fixture;
}

// ------------------------------------------------------------------ the table of worst errors

interface Cell {
  worst: number;
  note: string | null;
}
const table = new Map<string, Map<string, Cell>>();
const GROUP_ORDER = [
  'coefficients', 'classical SE', 'classical t', 'classical p', 'RSS', 'sigma^2', 'R^2',
  'HC0 SE', 'HC1 SE', 'HC2 SE', 'HC3 SE', 'HC3 t', 'HC3 p', 'NW SE auto lag', 'NW SE lag 2', 'cluster SE',
  'prediction estimate', 'prediction SE classical', 'prediction interval classical', 'prediction SE HC3', 'prediction interval HC3',
  'RESET F', 'RESET F p', 'Breusch-Pagan studentised', 'Breusch-Pagan studentised p', 'Breusch-Pagan original',
  'Breusch-Pagan original p', 'White', 'White p', 'Durbin-Watson', 'Breusch-Godfrey LM', 'Breusch-Godfrey LM p',
  'Breusch-Godfrey F', 'Breusch-Godfrey F p', 'Jarque-Bera', 'Jarque-Bera p', 'VIF',
];
const groupOrder: string[] = [...GROUP_ORDER];

function record(dataset: string, group: string, error: number, note: string | null = null): void {
  if (!table.has(group)) table.set(group, new Map());
  if (!groupOrder.includes(group)) groupOrder.push(group);
  const row = table.get(group)!;
  const previous = row.get(dataset);
  const worst = Math.max(previous?.worst ?? 0, Number.isNaN(error) ? Infinity : error);
  row.set(dataset, { worst, note: note ?? previous?.note ?? null });
}

function formatCell(cell: Cell | undefined): string {
  if (!cell) return '-';
  if (cell.note) return cell.note;
  if (!Number.isFinite(cell.worst)) return 'inf FAIL';
  const text = cell.worst === 0 ? '0' : cell.worst.toExponential(1);
  return cell.worst <= TOLERANCE ? text : `${text} FAIL`;
}

afterAll(() => {
  const labelWidth = Math.max(...groupOrder.map((group) => group.length), 8) + 1;
  const width = 14;
  const abbreviations = DATASETS.map((name) => name.replace('epoch-milliseconds', 'epoch-ms').replace('price-level-no-intercept', 'price-no-int').slice(0, width - 2));
  const lines = [
    `Worst relative error against the exact rational reference (generate-exact-references.mjs); tolerance ${TOLERANCE}`,
    'quantity'.padEnd(labelWidth) + abbreviations.map((name) => name.padStart(width)).join(''),
    ...groupOrder.map(
      (group) => group.padEnd(labelWidth) + DATASETS.map((dataset) => formatCell(table.get(group)?.get(dataset)).padStart(width)).join(''),
    ),
  ];
  console.log(lines.join('\n'));
});

// ------------------------------------------------------------------ comparisons

function relativeError(engine: number | null | undefined, reference: string): number {
  if (typeof engine !== 'number' || !Number.isFinite(engine)) return Infinity;
  const expected = Number(reference);
  return expected === 0 ? Math.abs(engine) : Math.abs(engine - expected) / Math.abs(expected);
}

type Pairs = [number | null | undefined, string][];

/**
 * Records the worst relative error of `pairs` for (dataset, group) and returns it; `expectWithin` then
 * asserts every group of the test, so one failing group does not hide the others from the table. An
 * engine error is recorded as such and rethrown, so the test fails with the engine's message.
 */
function compare(dataset: string, group: string, compute: () => Pairs): number {
  let pairs: Pairs;
  try {
    pairs = compute();
  } catch (error) {
    record(dataset, group, Infinity, 'threw FAIL');
    throw error;
  }
  const worst = Math.max(...pairs.map(([engine, reference]) => relativeError(engine, reference)));
  record(dataset, group, worst);
  return worst;
}

/** Every worst relative error within the tolerance (source: exact rational reference, generate-exact-references.mjs). */
function expectWithin(worstByGroup: Record<string, number>, tolerance = TOLERANCE): void {
  const outside = Object.entries(worstByGroup).filter(([, worst]) => !(worst <= tolerance));
  expect(outside).toEqual([]);
}

// ------------------------------------------------------------------ engine calls, as the app makes them

function memo<T>(compute: () => T): () => T {
  let outcome: { value: T } | { error: unknown } | null = null;
  return () => {
    if (outcome === null) {
      try {
        outcome = { value: compute() };
      } catch (error) {
        outcome = { error };
      }
    }
    if ('error' in outcome) throw outcome.error;
    return outcome.value;
  };
}

function engineCalls(fixture: Fixture) {
  const columns: Record<string, Float64Array> = {};
  for (const [name, values] of Object.entries(fixture.columns)) columns[name] = Float64Array.from(values);
  const fitInput: FitInput = {
    columns,
    response: fixture.response,
    predictors: fixture.predictors,
    intercept: fixture.intercept,
    ...(fixture.weights ? { weights: fixture.weights } : {}),
  };
  const analysis = (covariance: CovarianceOption | undefined, extra: Partial<AnalysisInput> = {}) =>
    memo((): AnalysisResult => analyseModel({ ...fitInput, ...(covariance ? { covariance } : {}), ...extra }));
  const onlyCoefficients = { diagnostics: [] } as Partial<AnalysisInput>;
  const cluster: CovarianceOption | null = fixture.groups ? { type: 'cluster', groups: fixture.groups } : null;
  return {
    fit: memo((): FitResult => fitModel(fitInput)),
    classical: analysis(undefined),
    variants: analysis(undefined, {
      diagnostics: ['breusch-pagan', 'breusch-godfrey'],
      diagnosticOptions: { breuschPaganVariant: 'original', breuschGodfreyVariant: 'f' },
    }),
    hc0: analysis({ type: 'hc0' }, onlyCoefficients),
    hc1: analysis({ type: 'hc1' }, onlyCoefficients),
    hc2: analysis({ type: 'hc2' }, onlyCoefficients),
    hc3: analysis({ type: 'hc3' }, onlyCoefficients),
    neweyWestAutomatic: analysis({ type: 'newey-west', lag: 'automatic' }, onlyCoefficients),
    neweyWestLag2: analysis({ type: 'newey-west', lag: 2 }, onlyCoefficients),
    cluster: cluster ? analysis(cluster, onlyCoefficients) : null,
    predictClassical: memo(() => predict({ ...fitInput, points: fixture.points })),
    predictHc3: memo(() => predict({ ...fitInput, points: fixture.points, covariance: { type: 'hc3' } })),
  };
}

type DiagnosticKey = 'reset' | 'breuschPagan' | 'white' | 'durbinWatson' | 'breuschGodfrey' | 'jarqueBera' | 'collinearity';

/** The computed entry of one check; a check reported as not defined is recorded and fails the test. */
function computedCheck(dataset: string, groups: string[], analysis: () => AnalysisResult, key: DiagnosticKey) {
  let result: AnalysisResult;
  try {
    result = analysis();
  } catch (error) {
    for (const group of groups) record(dataset, group, Infinity, 'threw FAIL');
    throw error;
  }
  const entry = result.diagnostics[key];
  if (entry?.status !== 'computed') for (const group of groups) record(dataset, group, Infinity, 'n/d FAIL');
  expect(entry?.status).toBe('computed');
  return entry as Extract<NonNullable<AnalysisResult['diagnostics'][DiagnosticKey]>, { status: 'computed' }>;
}

/** The analysis, with an engine error recorded against `group` and rethrown. */
function computedOrUndefined(dataset: string, group: string, analysis: () => AnalysisResult): AnalysisResult {
  try {
    return analysis();
  } catch (error) {
    record(dataset, group, Infinity, 'threw FAIL');
    throw error;
  }
}

function expectDegreesOfFreedom(
  dataset: string,
  groups: string[],
  outcome: { degreesOfFreedom: number | null; denominatorDegreesOfFreedom: number | null },
  reference: CheckReference,
): void {
  const same =
    outcome.degreesOfFreedom === reference.degreesOfFreedom &&
    outcome.denominatorDegreesOfFreedom === reference.denominatorDegreesOfFreedom;
  if (!same) for (const group of groups) record(dataset, group, Infinity, 'df FAIL');
  expect([outcome.degreesOfFreedom, outcome.denominatorDegreesOfFreedom]).toEqual([
    reference.degreesOfFreedom,
    reference.denominatorDegreesOfFreedom,
  ]);
}

// ------------------------------------------------------------------ the tests

describe.each(DATASETS)('exact rational reference (generate-exact-references.mjs): %s', (name) => {
  const fixture = loadFixture(name);
  const reference = fixture.reference;
  const calls = engineCalls(fixture);
  const rows = <T>(values: T[], pick: (value: T, j: number) => [number | null | undefined, string]): Pairs => values.map(pick);

  it('coefficients (fitModel and analyseModel) within 1e-10 of the exact reference', () => {
    expectWithin({
      coefficients: compare(name, 'coefficients', () => [
        ...rows(calls.fit().coefficients, (row, j) => [row.estimate, reference.coefficients[j]!]),
        ...rows(calls.classical().coefficients, (row, j) => [row.estimate, reference.coefficients[j]!]),
      ]),
    });
  });

  it('classical standard errors, t-statistics and two-sided p-values (Student t, n - p df) within 1e-10 of the exact reference', () => {
    expectWithin({
      standardErrors: compare(name, 'classical SE', () => [
        ...rows(calls.fit().coefficients, (row, j) => [row.standardError, reference.classicalStandardErrors[j]!]),
        ...rows(calls.classical().coefficients, (row, j) => [row.standardError, reference.classicalStandardErrors[j]!]),
      ]),
      tStatistics: compare(name, 'classical t', () =>
        rows(calls.fit().coefficients, (row, j) => [row.tStatistic, reference.classicalInference.tStatistics[j]!]),
      ),
      pValues: compare(name, 'classical p', () => rows(calls.fit().coefficients, (row, j) => [row.pValue, reference.classicalInference.pValues[j]!])),
    });
  });

  it('residual sum of squares, sigma^2 and R^2 within 1e-10 of the exact reference', () => {
    expectWithin({
      residualSumOfSquares: compare(name, 'RSS', () => [[calls.fit().anova.residual.sumOfSquares, reference.residualSumOfSquares]]),
      residualVariance: compare(name, 'sigma^2', () => [[calls.fit().anova.residual.meanSquare, reference.residualVariance]]),
      rSquared: compare(name, 'R^2', () => [[calls.fit().rSquared, reference.rSquared]]),
    });
    expect(calls.fit().rSquaredDefinition).toBe(reference.rSquaredDefinition);
  });

  it.each(['hc0', 'hc1', 'hc2', 'hc3'] as const)('%s standard errors within 1e-10 of the exact reference', (type) => {
    expectWithin({
      [type]: compare(name, `${type.toUpperCase()} SE`, () =>
        rows(calls[type]().coefficients, (row, j) => [row.standardError, reference.standardErrors[type][j]!]),
      ),
    });
  });

  it('HC3 t-statistics and p-values (n - p df) within 1e-10 of the exact reference', () => {
    expectWithin({
      tStatistics: compare(name, 'HC3 t', () => rows(calls.hc3().coefficients, (row, j) => [row.tStatistic, reference.hc3Inference.tStatistics[j]!])),
      pValues: compare(name, 'HC3 p', () => rows(calls.hc3().coefficients, (row, j) => [row.pValue, reference.hc3Inference.pValues[j]!])),
    });
  });

  it('Newey-West standard errors (Bartlett weights, automatic lag and lag 2, no small-sample factor) within 1e-10 of the exact reference', () => {
    const { neweyWestAutomatic, neweyWestLag2 } = reference.standardErrors;
    expectWithin({
      automaticLag: compare(name, 'NW SE auto lag', () =>
        rows(calls.neweyWestAutomatic().coefficients, (row, j) => [row.standardError, neweyWestAutomatic.standardErrors[j]!]),
      ),
      lagTwo: compare(name, 'NW SE lag 2', () =>
        rows(calls.neweyWestLag2().coefficients, (row, j) => [row.standardError, neweyWestLag2.standardErrors[j]!]),
      ),
    });
    expect([calls.neweyWestAutomatic().covariance.lag, calls.neweyWestLag2().covariance.lag]).toEqual([neweyWestAutomatic.lag, 2]);
  });

  const clusterReference = reference.standardErrors.cluster;
  if (clusterReference) {
    it('cluster CR1 standard errors within 1e-10 of the exact reference, with G groups and G - 1 df', () => {
      const cluster = calls.cluster!;
      expectWithin({
        cluster: compare(name, 'cluster SE', () => rows(cluster().coefficients, (row, j) => [row.standardError, clusterReference.standardErrors[j]!])),
      });
      expect([cluster().covariance.clusterCount, cluster().covariance.inferenceDegreesOfFreedom]).toEqual([
        clusterReference.groupCount,
        clusterReference.degreesOfFreedom,
      ]);
    });
  }

  it.each([
    ['classical', 'predictClassical'],
    ['HC3', 'predictHc3'],
  ] as const)('predictions under the %s covariance within 1e-10 of the exact reference', (label, call) => {
    const expected = reference.predictions[label === 'HC3' ? 'hc3' : 'classical'];
    const modelScale = () => calls[call]().predictions.map((prediction) => prediction.modelScale);
    expectWithin({
      estimate: compare(name, 'prediction estimate', () => rows(modelScale(), (scale, k) => [scale.estimate, expected[k]!.estimate])),
      standardErrors: compare(name, `prediction SE ${label}`, () =>
        modelScale().flatMap((scale, k): Pairs => [
          [scale.standardErrorOfMean, expected[k]!.standardErrorOfMean],
          [scale.standardErrorOfPrediction, expected[k]!.standardErrorOfPrediction],
        ]),
      ),
      intervals: compare(name, `prediction interval ${label}`, () =>
        modelScale().flatMap((scale, k): Pairs => [
          [scale.confidenceInterval.lower, expected[k]!.confidenceInterval[0]],
          [scale.confidenceInterval.upper, expected[k]!.confidenceInterval[1]],
          [scale.predictionInterval.lower, expected[k]!.predictionInterval[0]],
          [scale.predictionInterval.upper, expected[k]!.predictionInterval[1]],
        ]),
      ),
    });
  });

  const checks = reference.checks;
  const outcomeTests: [string, () => AnalysisResult, DiagnosticKey, CheckReference][] = [
    ['RESET F', calls.classical, 'reset', checks.reset],
    ['Breusch-Pagan studentised', calls.classical, 'breuschPagan', checks.breuschPaganStudentised],
    ['Breusch-Pagan original', calls.variants, 'breuschPagan', checks.breuschPaganOriginal],
    ['Breusch-Godfrey LM', calls.classical, 'breuschGodfrey', checks.breuschGodfreyLm],
    ['Breusch-Godfrey F', calls.variants, 'breuschGodfrey', checks.breuschGodfreyF],
    ['Jarque-Bera', calls.classical, 'jarqueBera', checks.jarqueBera],
  ];
  const white = checks.white;
  if ('statistic' in white) outcomeTests.push(['White', calls.classical, 'white', white]);

  it.each(outcomeTests)('%s: statistic, degrees of freedom and p-value within 1e-10 of the exact reference', (label, analysis, key, expected) => {
    const groups = [label, `${label} p`];
    const entry = computedCheck(name, groups, analysis, key) as unknown as {
      statistic: number;
      pValue: number;
      degreesOfFreedom: number | null;
      denominatorDegreesOfFreedom: number | null;
    };
    expectWithin({
      statistic: compare(name, label, () => [[entry.statistic, expected.statistic]]),
      pValue: compare(name, `${label} p`, () => [[entry.pValue, expected.pValue]]),
    });
    expectDegreesOfFreedom(name, groups, entry, expected);
  });

  if ('notDefined' in white) {
    it(`White is reported as not defined (${white.notDefined})`, () => {
      const entry = computedOrUndefined(name, 'White', calls.classical)?.diagnostics.white;
      record(name, 'White', 0, entry?.status === 'not-defined' ? 'n/d (ok)' : 'computed FAIL');
      expect(entry?.status).toBe('not-defined');
    });
  }
  if ('excluded' in white) {
    // Not compared: the fixture states why no engine-independent exact value exists (see the fixtures'
    // README); the table shows the exclusion so that it is never silent.
    record(name, 'White', 0, 'excluded');
  }

  it('Durbin-Watson statistic within 1e-10 of the exact reference (its beta-approximation p-value has no exact reference)', () => {
    const entry = computedCheck(name, ['Durbin-Watson'], calls.classical, 'durbinWatson') as unknown as { statistic: number };
    expectWithin({ statistic: compare(name, 'Durbin-Watson', () => [[entry.statistic, checks.durbinWatson.statistic]]) });
  });

  const inflation = reference.varianceInflation;
  if (inflation) {
    it('variance inflation factors within 1e-10 of the exact reference', () => {
      const entry = computedCheck(name, ['VIF'], calls.classical, 'collinearity') as unknown as {
        varianceInflation: { term: string; varianceInflationFactor: number }[];
      };
      expectWithin({
        varianceInflation: compare(name, 'VIF', () =>
          inflation.map(({ term, value }) => [entry.varianceInflation.find((row) => row.term === term)?.varianceInflationFactor, value]),
        ),
      });
    });
  }
});
