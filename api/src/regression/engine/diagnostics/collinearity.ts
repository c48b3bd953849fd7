/**
 * Collinearity measures of the design.
 *
 * Variance inflation factors (Marquardt 1970, Technometrics 12(3), 591-612): for each non-intercept
 * predictor j, VIF_j = 1 / (1 - R^2_j), where R^2_j is the centred R^2 of the regression of x_j on the
 * other non-intercept predictors and a constant (the constant is included even for a model without an
 * intercept; weighted fits use the same weights). With one predictor, VIF = 1.
 *
 * Condition number (Belsley, Kuh & Welsch 1980, "Regression Diagnostics", Wiley, chapter 3): the ratio
 * of the largest to the smallest singular value of the design with every column, the intercept column
 * included, scaled to unit Euclidean length and not centred (whitened columns for a weighted fit). The
 * singular values are those of R from a Householder QR of the scaled design, computed by ml-matrix.
 * Condition indices sigma_max / sigma_k are returned in decreasing order of sigma_k.
 */

import { EigenvalueDecomposition, SingularValueDecomposition, Matrix } from 'ml-matrix';
import { DoubleDoubleAccumulator } from '../double-double';
import { EngineError } from '../errors';
import { householderFactorise, upperEntry } from '../householder-qr';
import { fitAuxiliary } from './auxiliary-regression';
import { FittedModel, whitenedColumns, workingColumns } from './model-context';

export interface VarianceInflation {
  term: string;
  rSquared: number;
  varianceInflationFactor: number;
}

export interface CollinearityResult {
  varianceInflation: VarianceInflation[];
  conditionNumber: number;
  conditionIndices: number[];
  /** True when the model has an intercept: its column of ones takes part in the condition number. */
  interceptIncluded: boolean;
  columnsScaledToUnitLength: true;
}

export function varianceInflationFactors(model: FittedModel): VarianceInflation[] {
  const { design, weights } = model;
  const start = design.hasIntercept ? 1 : 0;
  const names = design.names.slice(start);
  // Working columns: each is an affine image of the caller's column, and every auxiliary regression here
  // has a constant, so R^2_j is unchanged, while offsets no longer enter the sums of squares.
  const columns = workingColumns(model).slice(start);
  return names.map((term, j) => {
    if (names.length === 1) return { term, rSquared: 0, varianceInflationFactor: 1 };
    const otherNames = names.filter((_, k) => k !== j);
    const otherColumns = columns.filter((_, k) => k !== j);
    const fit = fitAuxiliary(otherNames, otherColumns, columns[j]!, { constant: true, ...(weights ? { weights } : {}) });
    const unexplained = fit.residualSumOfSquares / fit.centredTotalSumOfSquares;
    return { term, rSquared: 1 - unexplained, varianceInflationFactor: 1 / unexplained };
  });
}

export function scaledSingularValues(columns: Float64Array[], n: number): number[] {
  const scaled = columns.map((column) => {
    let squares = 0;
    for (let i = 0; i < n; i++) squares += column[i]! * column[i]!;
    const inverse = 1 / Math.sqrt(squares);
    return column.map((value) => value * inverse);
  });
  const p = scaled.length;
  const outcome = householderFactorise(scaled, n, 0, new Float64Array(p).fill(1));
  if (!('factor' in outcome)) {
    throw new EngineError('collinear-columns', 'The design is exactly singular, so its condition number is infinite.', {
      field: 'diagnostics',
    });
  }
  const triangle = Matrix.zeros(p, p);
  for (let i = 0; i < p; i++) for (let j = i; j < p; j++) triangle.set(i, j, upperEntry(outcome.factor, i, j));
  const values = new SingularValueDecomposition(triangle, { computeLeftSingularVectors: false, computeRightSingularVectors: false })
    .diagonal;
  return [...values].sort((a, b) => b - a);
}

export function collinearityMeasures(model: FittedModel): CollinearityResult {
  const singular = scaledSingularValuesOfModel(model);
  const largest = singular[0]!;
  const smallest = singular[singular.length - 1]!;
  return {
    varianceInflation: varianceInflationFactors(model),
    conditionNumber: largest / smallest,
    conditionIndices: singular.map((value) => largest / value),
    interceptIncluded: model.design.hasIntercept,
    columnsScaledToUnitLength: true,
  };
}

/**
 * Singular values of the unit-length-scaled design (whitened), without factorising the raw columns: on
 * offset data (epoch timestamps) the scaled design is nearly singular by definition, and a QR of its raw
 * columns would lose the small singular values. Instead, with D = diag(1 / ||x_j||):
 *   the large ones come from G = D X'WX D, formed with double-double sums (eigenvalues accurate to
 *   eps lambda_max), and the small ones from G^-1 = D^-1 (X'WX)^-1 D^-1, whose (X'WX)^-1 the solver
 *   computed in its working coordinates to (nearly) full relative accuracy (eigenvalues accurate to
 *   eps / lambda_min). Each sigma_k is taken from whichever of the two determines it better.
 */
function scaledSingularValuesOfModel(model: FittedModel): number[] {
  const columns = whitenedColumns(model);
  const p = columns.length;
  const n = model.design.n;
  const norms = columns.map((column) => {
    let largest = 0;
    for (let i = 0; i < n; i++) largest = Math.max(largest, Math.abs(column[i]!));
    if (!(largest > 0)) return 0;
    let sum = 0;
    for (let i = 0; i < n; i++) sum += (column[i]! / largest) ** 2;
    return largest * Math.sqrt(sum);
  });
  if (norms.some((norm) => !(norm > 0 && Number.isFinite(norm)))) return scaledSingularValues(columns, n);
  const gram = Matrix.zeros(p, p);
  for (let j = 0; j < p; j++) {
    for (let k = j; k < p; k++) {
      const sum = new DoubleDoubleAccumulator();
      const left = columns[j]!;
      const right = columns[k]!;
      const a = 1 / norms[j]!;
      const b = 1 / norms[k]!;
      for (let i = 0; i < n; i++) sum.addProduct(left[i]! * a, right[i]! * b);
      gram.set(j, k, sum.value());
      gram.set(k, j, sum.value());
    }
  }
  const inverse = Matrix.zeros(p, p);
  const covariance = model.solution.unscaledCovariance;
  for (let j = 0; j < p; j++) for (let k = 0; k < p; k++) inverse.set(j, k, covariance[j]![k]! * norms[j]! * norms[k]!);
  const large = new EigenvalueDecomposition(gram, { assumeSymmetric: true }).realEigenvalues.map((value) => Math.max(value, 0));
  const small = new EigenvalueDecomposition(inverse, { assumeSymmetric: true }).realEigenvalues;
  large.sort((x, y) => y - x);
  small.sort((x, y) => x - y);
  const lambdaMax = large[0]!;
  const lambdaMin = 1 / small[small.length - 1]!;
  const middle = Math.sqrt(lambdaMax * lambdaMin);
  return large.map((value, k) => Math.sqrt(value >= middle ? value : 1 / small[k]!));
}
