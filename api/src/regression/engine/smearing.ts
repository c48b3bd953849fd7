/**
 * Back-transformation of a model for ln y to the scale of y.
 *
 * Naive: yhat = exp(xb), which estimates the median of y, not its mean, when errors are symmetric on
 * the log scale. Smeared: yhat = exp(xb) * S with Duan's smearing factor S = mean of exp(residual_i)
 * (Duan, 1983, "Smearing estimate: a nonparametric retransformation method", JASA 78, 605-610), which
 * estimates E[y | x] without assuming normal errors. With weights the mean is the weighted mean
 * sum w_i exp(e_i) / sum w_i.
 */

export function smearingFactor(logScaleResiduals: Float64Array, weights: Float64Array | null): number {
  let sum = 0;
  let weightSum = 0;
  for (let i = 0; i < logScaleResiduals.length; i++) {
    const w = weights ? weights[i]! : 1;
    sum += w * Math.exp(logScaleResiduals[i]!);
    weightSum += w;
  }
  return sum / weightSum;
}

export function backTransform(logScaleFitted: Float64Array, factor: number): Float64Array {
  const result = new Float64Array(logScaleFitted.length);
  for (let i = 0; i < result.length; i++) result[i] = Math.exp(logScaleFitted[i]!) * factor;
  return result;
}
