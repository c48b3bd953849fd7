/**
 * Batch fits: many responses against one shared set of predictors (for example 5,000 instruments
 * against one benchmark series), factorised once (batch-factorisation.ts). Each response gets its full
 * classical coefficient table (covariance sigma^2 (X'X)^-1, sigma^2 = RSS / (n - p), t with n - p
 * degrees of freedom), R^2 (centred with an intercept, uncentred without), adjusted R^2 and the F-test
 * of all slopes (all coefficients without an intercept) - the Wald test of covariance-inference.ts with
 * the classical covariance, which equals the ANOVA F.
 *
 * Errors: shared-input problems fail the whole call (EngineError `missing-column`, `length-mismatch`,
 * `non-finite-value`, `non-positive-log-argument`, `too-few-observations`, the factorisation's
 * collinearity errors; `invalid-argument` for an empty response list). A problem with one response (non-finite
 * value, log of a non-positive value, constant response) is reported in that response's entry with its
 * code, and the other responses are still fitted.
 */

import { CoefficientRow, coefficientInference, WaldTest } from './covariance-inference';
import { studentTInverseSurvival } from './distributions';
import { EngineError, EngineErrorCode } from './errors';
import { ColumnValues, validateConfidenceLevel, validateForm } from './fit-input';
import { FunctionalForm, predictorTransformation, responseTransformation, transformColumn } from './functional-forms';
import { factoriseShared, solveShared } from './batch-factorisation';
import { scale } from './diagnostics/small-matrix';

export interface BatchFitInput {
  columns: Record<string, ColumnValues>;
  /** Shared predictor column names. */
  predictors: string[];
  /** Response column names, each fitted against the shared predictors. */
  responses: string[];
  intercept?: boolean;
  form?: FunctionalForm;
  confidenceLevel?: number;
}

export interface BatchResponseFit {
  response: string;
  status: 'fitted';
  coefficients: CoefficientRow[];
  residualSumOfSquares: number;
  residualStandardError: number;
  rSquared: number;
  adjustedRSquared: number;
  fTest: WaldTest | null;
}

export interface BatchResponseFailure {
  response: string;
  status: 'failed';
  code: EngineErrorCode;
  message: string;
  row: number | null;
}

export interface BatchFitResult {
  form: FunctionalForm;
  observationCount: number;
  coefficientCount: number;
  residualDegreesOfFreedom: number;
  confidenceLevel: number;
  terms: string[];
  fits: (BatchResponseFit | BatchResponseFailure)[];
}

export function fitBatch(input: BatchFitInput): BatchFitResult {
  const form = validateForm(input.form);
  const confidenceLevel = validateConfidenceLevel(input.confidenceLevel);
  const intercept = input.intercept ?? true;
  if (!Array.isArray(input.predictors) || input.predictors.length === 0) {
    throw new EngineError('invalid-argument', '"predictors" must list at least one column name.', { field: 'predictors' });
  }
  if (!Array.isArray(input.responses) || input.responses.length === 0) {
    throw new EngineError('invalid-argument', '"responses" must list at least one column name.', { field: 'responses' });
  }
  const predictorColumns = input.predictors.map((name) => finiteColumn(input.columns, name));
  const n = predictorColumns[0]!.length;
  predictorColumns.forEach((column, j) => {
    if (column.length !== n) {
      throw new EngineError('length-mismatch', `Column "${input.predictors[j]}" has ${column.length} values, expected ${n}.`, {
        column: input.predictors[j]!,
      });
    }
  });
  const p = input.predictors.length + (intercept ? 1 : 0);
  if (n <= p) {
    throw new EngineError('too-few-observations', `${n} observations cannot estimate ${p} coefficients with residual degrees of freedom.`, {
      field: 'columns',
    });
  }
  const transformed = predictorColumns.map((column, j) => transformColumn(input.predictors[j]!, column, predictorTransformation(form)));
  const shared = factoriseShared(input.predictors, transformed, intercept);
  const degreesOfFreedom = n - p;
  const critical = studentTInverseSurvival((1 - confidenceLevel) / 2, degreesOfFreedom);
  const layout = { names: shared.names, hasIntercept: intercept };
  const fits = input.responses.map((name): BatchResponseFit | BatchResponseFailure => {
    try {
      const raw = finiteColumn(input.columns, name);
      if (raw.length !== n) {
        throw new EngineError('length-mismatch', `Column "${name}" has ${raw.length} values, expected ${n}.`, { column: name });
      }
      const response = transformColumn(name, raw, responseTransformation(form));
      const solution = solveShared(shared, response);
      if (!(solution.totalSumOfSquares > 0)) {
        throw new EngineError('constant-response', `Response "${name}" does not vary, so R^2 and the F-test are not defined.`, {
          column: name,
        });
      }
      const variance = solution.residualSumOfSquares / degreesOfFreedom;
      const inference = coefficientInference(
        layout,
        solution.coefficients,
        {
          matrix: scale(shared.unscaledCovariance, variance),
          description: {
            type: 'classical',
            lag: null,
            lagRule: null,
            kernel: null,
            clusterCount: null,
            smallSampleFactor: 1,
            inferenceDegreesOfFreedom: degreesOfFreedom,
          },
        },
        confidenceLevel,
        critical,
      );
      const rSquared = 1 - solution.residualSumOfSquares / solution.totalSumOfSquares;
      const baseline = intercept ? n - 1 : n;
      return {
        response: name,
        status: 'fitted',
        coefficients: inference.coefficients,
        residualSumOfSquares: solution.residualSumOfSquares,
        residualStandardError: Math.sqrt(variance),
        rSquared,
        adjustedRSquared: 1 - ((1 - rSquared) * baseline) / degreesOfFreedom,
        fTest: inference.waldTest,
      };
    } catch (error) {
      if (!(error instanceof EngineError) || error.column !== name) throw error;
      return { response: name, status: 'failed', code: error.code, message: error.message, row: error.row ?? null };
    }
  });
  return {
    form,
    observationCount: n,
    coefficientCount: p,
    residualDegreesOfFreedom: degreesOfFreedom,
    confidenceLevel,
    terms: shared.names,
    fits,
  };
}

/** The named column as finite doubles (a Float64Array is used as is). */
export function finiteColumn(columns: Record<string, ColumnValues>, name: string): Float64Array {
  const values = columns && Object.prototype.hasOwnProperty.call(columns, name) ? columns[name] : undefined;
  if (values === undefined || values === null || typeof (values as ArrayLike<unknown>).length !== 'number') {
    throw new EngineError('missing-column', `Column "${name}" is not among the supplied columns.`, { column: name });
  }
  const result = values instanceof Float64Array ? values : new Float64Array(values.length);
  for (let i = 0; i < values.length; i++) {
    const value = values[i];
    if (typeof value !== 'number' || !Number.isFinite(value)) {
      throw new EngineError('non-finite-value', `Column "${name}" has a missing or non-finite value at row ${i} (0-based).`, {
        column: name,
        row: i,
      });
    }
    result[i] = value;
  }
  return result;
}
