/**
 * The analysis-of-variance table of a least-squares fit, R² and adjusted R².
 *
 * With an intercept the total sum of squares is centred, sum w_i (y_i - ybar_w)^2 on n - 1 degrees of
 * freedom, and the regression line has p - 1. Without an intercept the total is uncentred,
 * sum w_i y_i^2 on n degrees of freedom, and the regression has p; R² is then the uncentred
 * 1 - RSS / sum w y^2 (the definition the NIST StRD certifies for its no-intercept datasets). The
 * regression sum of squares is total - residual, which equals sum w (yhat - ybar)^2 (or sum w yhat^2)
 * for a least-squares fit. Sums are accumulated in double-double.
 */

import { ddAdd, ddDiv, DoubleDoubleAccumulator, twoProduct } from './double-double';
import { fisherFSurvival } from './distributions';
import { EngineError } from './errors';

export interface AnovaLine {
  degreesOfFreedom: number;
  sumOfSquares: number;
  meanSquare: number;
}

export interface AnovaTable {
  regression: AnovaLine;
  residual: AnovaLine;
  total: AnovaLine;
  /** Regression mean square / residual mean square; null when the residual sum of squares is 0. */
  fStatistic: number | null;
  /** Upper-tail F probability of `fStatistic`; null when it is null. */
  fPValue: number | null;
}

export type RSquaredDefinition = 'centred' | 'uncentred';

export interface GoodnessOfFit {
  anova: AnovaTable;
  rSquared: number;
  adjustedRSquared: number;
  rSquaredDefinition: RSquaredDefinition;
}

/**
 * Total sum of squares in double-double: centred about the (weighted) mean when `centred`, else
 * uncentred. Two passes: the mean in double-double, then the squares of the exact deviations.
 */
export function totalSumOfSquares(
  response: Float64Array,
  weights: Float64Array | null,
  centred: boolean,
): number {
  const n = response.length;
  let meanHi = 0;
  let meanLo = 0;
  if (centred) {
    const sum = new DoubleDoubleAccumulator();
    const weightSum = new DoubleDoubleAccumulator();
    for (let i = 0; i < n; i++) {
      if (weights) {
        sum.addProduct(weights[i]!, response[i]!);
        weightSum.add(weights[i]!);
      } else sum.add(response[i]!);
    }
    const total = sum.normalised();
    const count = weights ? weightSum.normalised() : { hi: n, lo: 0 };
    const mean = ddDiv(total.hi, total.lo, count.hi, count.lo);
    meanHi = mean.hi;
    meanLo = mean.lo;
  }
  const squares = new DoubleDoubleAccumulator();
  for (let i = 0; i < n; i++) {
    const deviation = ddAdd(response[i]!, 0, -meanHi, -meanLo);
    // (hi + lo)^2 ~ hi^2 + 2 hi lo, each weighted
    const square = twoProduct(deviation.hi, deviation.hi);
    const cross = 2 * deviation.hi * deviation.lo;
    if (weights) {
      const w = weights[i]!;
      const weighted = twoProduct(w, square.hi);
      squares.addDoubleDouble(weighted.hi, weighted.lo + w * (square.lo + cross));
    } else squares.addDoubleDouble(square.hi, square.lo + cross);
  }
  return squares.value();
}

export function goodnessOfFit(
  n: number,
  parameterCount: number,
  hasIntercept: boolean,
  residualSumOfSquares: number,
  totalSum: number,
  responseName: string,
): GoodnessOfFit {
  if (Number.isNaN(totalSum) || totalSum === Infinity) {
    throw new EngineError(
      'magnitude-out-of-range',
      `The response "${responseName}" is so large (|y| near 1e154 or above) that its sum of squares exceeds the double ` +
        'range, so R² and the ANOVA table cannot be represented; rescale it (for example to thousands or millions).',
      { column: responseName },
    );
  }
  if (!(totalSum > 0)) {
    throw new EngineError(
      'constant-response',
      hasIntercept
        ? `The response "${responseName}" has the same value in every row (zero variance): there is nothing to explain.`
        : `The response "${responseName}" is zero in every row: there is nothing to explain.`,
      { column: responseName },
    );
  }
  const residualDf = n - parameterCount;
  const totalDf = hasIntercept ? n - 1 : n;
  const regressionDf = totalDf - residualDf;
  const regressionSum = Math.max(0, totalSum - residualSumOfSquares);
  const residualMean = residualSumOfSquares / residualDf;
  const regressionMean = regressionSum / regressionDf;
  const fStatistic = residualSumOfSquares > 0 ? regressionMean / residualMean : null;
  const fPValue = fStatistic === null ? null : fisherFSurvival(fStatistic, regressionDf, residualDf);
  // 1 - RSS/TSS evaluated as (TSS - RSS)/TSS in double-double to keep digits when R² is near 1.
  const explained = ddAdd(totalSum, 0, -residualSumOfSquares, 0);
  const ratio = ddDiv(explained.hi, explained.lo, totalSum, 0);
  const rSquared = Math.min(1, Math.max(0, ratio.hi + ratio.lo));
  const unexplained = residualSumOfSquares / totalSum;
  const adjustedRSquared = 1 - (unexplained * totalDf) / residualDf;
  return {
    anova: {
      regression: { degreesOfFreedom: regressionDf, sumOfSquares: regressionSum, meanSquare: regressionMean },
      residual: { degreesOfFreedom: residualDf, sumOfSquares: residualSumOfSquares, meanSquare: residualMean },
      total: { degreesOfFreedom: totalDf, sumOfSquares: totalSum, meanSquare: totalSum / totalDf },
      fStatistic,
      fPValue,
    },
    rSquared,
    adjustedRSquared,
    rSquaredDefinition: hasIntercept ? 'centred' : 'uncentred',
  };
}
