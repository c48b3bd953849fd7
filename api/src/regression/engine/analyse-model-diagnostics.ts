/**
 * The diagnostics block of analyseModel: runs the requested checks on a fitted model and reports each
 * either as computed or as not defined for this model (with the engine error's code and reason), so one
 * undefined check never hides the others.
 *
 * Collinearity has no p-value; its flag uses the common-practice thresholds VIF >= 10 or condition
 * number >= 30 (the latter from Belsley, Kuh & Welsch 1980, chapter 3).
 */

import { EngineError } from './errors';
import { AnalysisError, AnalysisErrorReason } from './diagnostics/analysis-error';
import { breuschGodfreyTest, BreuschGodfreyResult, BreuschGodfreyVariant } from './diagnostics/breusch-godfrey';
import { breuschPaganTest, BreuschPaganResult, BreuschPaganVariant } from './diagnostics/breusch-pagan';
import { collinearityMeasures, CollinearityResult } from './diagnostics/collinearity';
import { durbinWatsonTest, DurbinWatsonResult, SerialCorrelationAlternative } from './diagnostics/durbin-watson';
import { jarqueBeraTest, JarqueBeraResult } from './diagnostics/jarque-bera';
import { FittedModel } from './diagnostics/model-context';
import { resetTest, ResetResult } from './diagnostics/reset-test';
import { whiteTest, WhiteResult } from './diagnostics/white-test';

export const DIAGNOSTIC_NAMES = [
  'reset',
  'breusch-pagan',
  'white',
  'durbin-watson',
  'breusch-godfrey',
  'jarque-bera',
  'collinearity',
] as const;
export type DiagnosticName = (typeof DIAGNOSTIC_NAMES)[number];

export interface DiagnosticOptions {
  /** Highest power of the fitted values in RESET (default 3). */
  resetMaxPower?: number;
  breuschPaganVariant?: BreuschPaganVariant;
  /** Highest residual lag in Breusch-Godfrey (default 1). */
  breuschGodfreyLag?: number;
  breuschGodfreyVariant?: BreuschGodfreyVariant;
  durbinWatsonAlternative?: SerialCorrelationAlternative;
}

export const VIF_FLAG_THRESHOLD = 10;
export const CONDITION_NUMBER_FLAG_THRESHOLD = 30;

export interface CollinearityCheck extends CollinearityResult {
  flagged: boolean;
}

interface ResultsByName {
  reset: ResetResult;
  'breusch-pagan': BreuschPaganResult;
  white: WhiteResult;
  'durbin-watson': DurbinWatsonResult;
  'breusch-godfrey': BreuschGodfreyResult;
  'jarque-bera': JarqueBeraResult;
  collinearity: CollinearityCheck;
}

export type DiagnosticEntry<T> =
  | ({ status: 'computed' } & T)
  | { status: 'not-defined'; code: string; reason: AnalysisErrorReason | null; message: string };

/** Result keys are the check names in camelCase (JSON fields are camelCase; request values stay kebab-case). */
type CamelKey<S extends string> = S extends `${infer Head}-${infer Tail}` ? `${Head}${Capitalize<CamelKey<Tail>>}` : S;
export type DiagnosticResultKey = CamelKey<DiagnosticName>;

export function diagnosticResultKey(name: DiagnosticName): DiagnosticResultKey {
  return name.replace(/-([a-z])/g, (_, letter: string) => letter.toUpperCase()) as DiagnosticResultKey;
}

export type DiagnosticsBlock = { [K in DiagnosticName as CamelKey<K>]?: DiagnosticEntry<ResultsByName[K]> };

export function validateDiagnosticNames(requested: unknown): DiagnosticName[] {
  if (requested === undefined || requested === 'all') return [...DIAGNOSTIC_NAMES];
  if (!Array.isArray(requested)) {
    throw new AnalysisError('unknown-diagnostic', '"diagnostics" must be "all" or a list of check names.', { field: 'diagnostics' });
  }
  return requested.map((name: unknown, index) => {
    if (typeof name !== 'string' || !(DIAGNOSTIC_NAMES as readonly string[]).includes(name)) {
      throw new AnalysisError(
        'unknown-diagnostic',
        `Unknown check ${JSON.stringify(name)}; use any of ${DIAGNOSTIC_NAMES.join(', ')}.`,
        { field: `diagnostics/${index}` },
      );
    }
    return name as DiagnosticName;
  });
}

const CHOICES: { [K in 'breuschPaganVariant' | 'breuschGodfreyVariant' | 'durbinWatsonAlternative']: readonly string[] } = {
  breuschPaganVariant: ['studentised', 'original'],
  breuschGodfreyVariant: ['lm', 'f'],
  durbinWatsonAlternative: ['positive', 'negative', 'two-sided'],
};

export function validateDiagnosticOptions(options: unknown): DiagnosticOptions {
  if (options === undefined) return {};
  if (options === null || typeof options !== 'object') {
    throw new AnalysisError('unknown-diagnostic', '"diagnosticOptions" must be an object.', { field: 'diagnosticOptions' });
  }
  const record = options as Record<string, unknown>;
  for (const [key, allowed] of Object.entries(CHOICES)) {
    const value = record[key];
    if (value !== undefined && (typeof value !== 'string' || !allowed.includes(value))) {
      throw new AnalysisError('unknown-diagnostic', `"${key}" must be one of ${allowed.join(', ')}; got ${JSON.stringify(value)}.`, {
        field: `diagnosticOptions.${key}`,
      });
    }
  }
  return record as DiagnosticOptions;
}

export function runDiagnostics(
  model: FittedModel,
  names: DiagnosticName[],
  significanceLevel: number,
  options: DiagnosticOptions = {},
): DiagnosticsBlock {
  const block: DiagnosticsBlock = {};
  const runners: { [K in DiagnosticName]: () => ResultsByName[K] } = {
    reset: () => resetTest(model, significanceLevel, options.resetMaxPower),
    'breusch-pagan': () => breuschPaganTest(model, significanceLevel, options.breuschPaganVariant),
    white: () => whiteTest(model, significanceLevel),
    'durbin-watson': () => durbinWatsonTest(model, significanceLevel, options.durbinWatsonAlternative),
    'breusch-godfrey': () =>
      breuschGodfreyTest(model, significanceLevel, options.breuschGodfreyLag, options.breuschGodfreyVariant),
    'jarque-bera': () => jarqueBeraTest(model, significanceLevel),
    collinearity: () => {
      const measures = collinearityMeasures(model);
      const flagged =
        measures.conditionNumber >= CONDITION_NUMBER_FLAG_THRESHOLD ||
        measures.varianceInflation.some((entry) => entry.varianceInflationFactor >= VIF_FLAG_THRESHOLD);
      return { ...measures, flagged };
    },
  };
  for (const name of names) {
    (block as Record<string, unknown>)[diagnosticResultKey(name)] = runOne(runners[name] as () => object, options);
  }
  return block;
}

function runOne<T>(runner: () => T, options: DiagnosticOptions): DiagnosticEntry<T> {
  try {
    return { status: 'computed', ...runner() };
  } catch (error) {
    // A check that cannot run with its defaults (a default lag longer than a tiny sample allows) is
    // reported in place; an option the caller set explicitly is the caller's to fix, so it fails the call.
    if (error instanceof AnalysisError && error.field?.startsWith('diagnosticOptions.')) {
      const option = error.field.slice('diagnosticOptions.'.length) as keyof DiagnosticOptions;
      if (options[option] !== undefined) throw error;
    }
    if (error instanceof EngineError) {
      return {
        status: 'not-defined',
        code: error.code,
        reason: error instanceof AnalysisError ? error.reason : null,
        message: error.message,
      };
    }
    throw error;
  }
}
