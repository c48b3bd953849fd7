/**
 * The auxiliary regressions behind the LM-type tests (Breusch-Pagan, White, Breusch-Godfrey) and the
 * variance inflation factors.
 *
 * Auxiliary regressors are generated mechanically (squares, cross-products, lagged residuals), so some
 * may repeat or combine others exactly (a dummy's square is the dummy itself). Such a column carries no
 * new direction: it is dropped, as the test's definition asks, and the degrees of freedom count only the
 * columns kept. The judgement uses the engine's own rank test (a tolerance scaled to the data).
 */

import { EngineError } from '../errors';
import { DesignMatrix, INTERCEPT_NAME, solveLeastSquares } from '../least-squares';

export interface AuxiliaryFit {
  residualSumOfSquares: number;
  /** sum (y - mean y)^2. */
  centredTotalSumOfSquares: number;
  /** sum y^2. */
  rawTotalSumOfSquares: number;
  /** Names of the regressors kept, in order (without the constant). */
  keptNames: string[];
  droppedNames: string[];
  /** Number of fitted coefficients, the constant included. */
  coefficientCount: number;
}

const DROPPABLE = new Set(['collinear-columns', 'constant-column', 'zero-column']);

export function fitAuxiliary(
  names: string[],
  columns: Float64Array[],
  response: Float64Array,
  options: { constant: boolean; weights?: Float64Array },
): AuxiliaryFit {
  const n = response.length;
  let keptNames = [...names];
  let keptColumns = [...columns];
  const droppedNames: string[] = [];
  const ones = options.constant ? new Float64Array(n).fill(1) : null;
  for (;;) {
    const design: DesignMatrix = {
      names: ones ? [INTERCEPT_NAME, ...keptNames] : keptNames,
      columns: ones ? [ones, ...keptColumns] : keptColumns,
      n,
      hasIntercept: ones !== null,
    };
    try {
      const solution = solveLeastSquares(design, response, options.weights ? { weights: options.weights } : {});
      return {
        residualSumOfSquares: solution.residualSumOfSquares,
        centredTotalSumOfSquares: centredSquares(response, options.weights),
        rawTotalSumOfSquares: rawSquares(response, options.weights),
        keptNames,
        droppedNames,
        coefficientCount: design.columns.length,
      };
    } catch (error) {
      const index =
        error instanceof EngineError && DROPPABLE.has(error.code) && error.column !== undefined
          ? keptNames.indexOf(error.column)
          : -1;
      if (index < 0) throw error;
      droppedNames.push(keptNames[index]!);
      keptNames = keptNames.filter((_, j) => j !== index);
      keptColumns = keptColumns.filter((_, j) => j !== index);
      if (keptNames.length === 0 && !ones) throw error;
    }
  }
}

function centredSquares(values: Float64Array, weights: Float64Array | undefined): number {
  let weightTotal = 0;
  let mean = 0;
  for (let i = 0; i < values.length; i++) {
    const w = weights ? weights[i]! : 1;
    weightTotal += w;
    mean += w * values[i]!;
  }
  mean /= weightTotal;
  let sum = 0;
  for (let i = 0; i < values.length; i++) {
    const deviation = values[i]! - mean;
    sum += (weights ? weights[i]! : 1) * deviation * deviation;
  }
  return sum;
}

function rawSquares(values: Float64Array, weights: Float64Array | undefined): number {
  let sum = 0;
  for (let i = 0; i < values.length; i++) sum += (weights ? weights[i]! : 1) * values[i]! * values[i]!;
  return sum;
}
