/**
 * Shared pieces of the diagnostics and covariance tests: building a fitted model from plain columns, and
 * direct least squares written independently with ml-matrix (normal equations via a matrix inverse),
 * so that checks do not reuse the engine's own solver for their expected values.
 */

import { inverse, Matrix } from 'ml-matrix';
import { DesignMatrix, INTERCEPT_NAME, solveLeastSquares } from '../least-squares';
import { FittedModel } from './model-context';

export function fittedModel(
  predictors: Record<string, ArrayLike<number>>,
  response: ArrayLike<number>,
  options: { intercept?: boolean; weights?: ArrayLike<number> } = {},
): FittedModel {
  const intercept = options.intercept ?? true;
  const n = response.length;
  const names = Object.keys(predictors);
  const columns = names.map((name) => Float64Array.from(predictors[name]!));
  const design: DesignMatrix = intercept
    ? { names: [INTERCEPT_NAME, ...names], columns: [new Float64Array(n).fill(1), ...columns], n, hasIntercept: true }
    : { names, columns, n, hasIntercept: false };
  const y = Float64Array.from(response);
  const weights = options.weights ? Float64Array.from(options.weights) : undefined;
  const solution = solveLeastSquares(design, y, { ...(weights ? { weights } : {}), computeLeverage: true });
  return { design, response: y, solution, ...(weights ? { weights } : {}) };
}

/** Rows of X as a Matrix, from columns. */
export function rowMatrix(columns: ArrayLike<number>[]): Matrix {
  const n = columns[0]!.length;
  const rows: number[][] = [];
  for (let i = 0; i < n; i++) rows.push(columns.map((column) => column[i]!));
  return new Matrix(rows);
}

/** Direct OLS: b = (X'X)^-1 X'y, residual sum of squares and centred/raw totals. */
export function normalEquationsFit(columns: ArrayLike<number>[], y: ArrayLike<number>) {
  const x = rowMatrix(columns);
  const yColumn = Matrix.columnVector(Array.from(y));
  const inverseGram = inverse(x.transpose().mmul(x));
  const b = inverseGram.mmul(x.transpose()).mmul(yColumn);
  const residuals = yColumn.clone().sub(x.mmul(b)).to1DArray();
  const rss = residuals.reduce((sum, value) => sum + value * value, 0);
  const values = Array.from(y);
  const mean = values.reduce((sum, value) => sum + value, 0) / values.length;
  const centredTotal = values.reduce((sum, value) => sum + (value - mean) ** 2, 0);
  return { b: b.to1DArray(), residuals, rss, centredTotal, inverseGram, x };
}

export function ones(n: number): Float64Array {
  return new Float64Array(n).fill(1);
}
