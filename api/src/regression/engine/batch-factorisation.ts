/**
 * One factorisation of a shared design, reused for many responses.
 *
 * The design goes through exactly the path of a single fit: the centred and scaled working design
 * (working-design.ts, with its rules for zero, constant and near-constant columns), its Householder QR
 * with the engine's one rank test (refined-qr-solver.ts, collinear columns named), and for each response
 * the iterative refinement with double-double residuals. A batch therefore reaches the accuracy of
 * /v1/fits for every response and refuses the same columns; the factorisation O(n p^2) and the
 * covariance of the coefficients (the same for every response) are paid once, each response costs a few
 * O(n p) passes.
 *
 * Errors: those of prepareWorkingDesign and factoriseWorking (`zero-column`, `constant-column`,
 * `collinear-columns`, `non-finite-value`), naming the predictor.
 */

import { INTERCEPT_NAME } from './least-squares';
import { isPerfectFit } from './perfect-fit';
import { factoriseWorking, mappedCovariance, solveWithFactor, WorkingFactor, workingGramInverse } from './refined-qr-solver';
import { prepareWorkingDesign, weightedMean, WorkingDesign } from './working-design';

export interface SharedFactorisation {
  n: number;
  hasIntercept: boolean;
  /** Coefficient names in order (intercept first when present). */
  names: string[];
  design: WorkingDesign;
  factored: WorkingFactor;
  /** (X'X)^-1 in the caller's parametrisation, p rows. */
  unscaledCovariance: Float64Array[];
}

export interface SharedSolution {
  coefficients: Float64Array;
  /** Exactly 0 for a perfect fit (perfect-fit.ts). */
  residualSumOfSquares: number;
  /** sum (y - mean y)^2 for intercept models, sum y^2 otherwise. */
  totalSumOfSquares: number;
}

export function factoriseShared(predictorNames: string[], columns: Float64Array[], hasIntercept: boolean): SharedFactorisation {
  const n = columns[0]?.length ?? 0;
  const names = hasIntercept ? [INTERCEPT_NAME, ...predictorNames] : [...predictorNames];
  const designColumns = hasIntercept ? [new Float64Array(n).fill(1), ...columns] : columns;
  const design = prepareWorkingDesign(names, designColumns, n, hasIntercept, undefined);
  const factored = factoriseWorking(design);
  const inverse = workingGramInverse(design, factored);
  return {
    n,
    hasIntercept,
    names,
    design,
    factored,
    unscaledCovariance: mappedCovariance(design, inverse.hi, inverse.lo),
  };
}

/** Least squares for one response against the shared factorisation. */
export function solveShared(shared: SharedFactorisation, response: Float64Array): SharedSolution {
  const { n, hasIntercept, design, factored } = shared;
  const solution = solveWithFactor(design, factored.factor, response);
  const perfect = isPerfectFit(solution.residuals, response, undefined);
  let totalSumOfSquares = 0;
  const mean = hasIntercept ? weightedMean(response, undefined, n, n) : 0;
  for (let i = 0; i < n; i++) {
    const deviation = response[i]! - mean;
    totalSumOfSquares += deviation * deviation;
  }
  return {
    coefficients: solution.coefficients,
    residualSumOfSquares: perfect ? 0 : solution.residualSumOfSquares,
    totalSumOfSquares,
  };
}
