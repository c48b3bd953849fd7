/**
 * Gaussian log-likelihood, AIC and BIC of a least-squares fit.
 *
 *   log-likelihood = -n/2 (ln(2 pi) + ln(RSS / n) + 1) + 1/2 sum ln w_i
 * is the maximised normal log-likelihood with sigma^2 estimated by RSS / n (the maximum-likelihood
 * estimate, not the unbiased RSS / (n - p)); the weight term is present for WLS, where observation i has
 * variance sigma^2 / w_i. With k = p + 1 parameters (the p coefficients and sigma counted as one),
 *   AIC = -2 log-likelihood + 2k,   BIC = -2 log-likelihood + k ln n.
 * Values are null for a perfect fit (RSS = 0), where the likelihood is unbounded.
 *
 * For a model of ln y, `jacobianAdjustment` converts the criteria to the scale of y: the density of
 * y is that of ln y times 1/y, so the log-likelihood gains -sum ln y_i (and AIC, BIC gain +2 sum ln y_i).
 */

export interface InformationCriteria {
  logLikelihood: number | null;
  aic: number | null;
  bic: number | null;
  /** k: coefficients plus one for sigma. */
  parameterCount: number;
}

export function informationCriteria(
  n: number,
  coefficientCount: number,
  residualSumOfSquares: number,
  weights: Float64Array | null,
  logLikelihoodShift = 0,
): InformationCriteria {
  const parameterCount = coefficientCount + 1;
  if (!(residualSumOfSquares > 0)) return { logLikelihood: null, aic: null, bic: null, parameterCount };
  let logWeights = 0;
  if (weights) for (let i = 0; i < n; i++) logWeights += Math.log(weights[i]!);
  const logLikelihood =
    -0.5 * n * (Math.log(2 * Math.PI) + Math.log(residualSumOfSquares / n) + 1) + 0.5 * logWeights + logLikelihoodShift;
  return {
    logLikelihood,
    aic: -2 * logLikelihood + 2 * parameterCount,
    bic: -2 * logLikelihood + parameterCount * Math.log(n),
    parameterCount,
  };
}

/** -sum ln y_i: the log-Jacobian of y -> ln y, added to a ln y model's log-likelihood. */
export function logJacobianOfLogResponse(response: Float64Array): number {
  let sum = 0;
  for (let i = 0; i < response.length; i++) sum += Math.log(response[i]!);
  return -sum;
}
