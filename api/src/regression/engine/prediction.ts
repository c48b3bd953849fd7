/**
 * Predictions at new predictor values, with a confidence interval for the mean response and a
 * prediction interval for one new observation.
 *
 * On the model's scale, for a point x0 (transformed as the form asks) with V the coefficient covariance
 * in use, sigma^2 = RSS / (n - p) and df the inference degrees of freedom:
 *   estimate            yhat0 = x0' b
 *   standardErrorOfMean sqrt(x0' V x0)
 *   standardErrorOfPrediction sqrt(sigma^2 + x0' V x0)   (a new observation of weight 1)
 *   intervals           estimate -/+ t_{df, (1 + level)/2} * standard error
 * (the classical formulas, e.g. Draper & Smith 1998, "Applied Regression Analysis", 3rd ed., section 3.1;
 * with a robust V the same formulas use the robust x0' V x0).
 *
 * Back on the original scale (log-y forms only), assuming normal errors on the log scale:
 *   estimate       exp(yhat0)              (the conditional median)
 *   meanEstimate   exp(yhat0 + sigma^2/2)  (the log-normal mean)
 *   smearedMeanEstimate exp(yhat0) * mean_i exp(e_i) (Duan 1983, JASA 78(383), 605-610; distribution-free),
 *                  present when the model supplies its smearing factor
 *   intervals      exp of the log-scale endpoints: an interval for the median, and a prediction
 *                  interval for a new observation (exact, since exp is monotone).
 *
 * Errors: AnalysisError `predictor-count-mismatch` (field `points`, row = point index);
 * EngineError `non-finite-value` (a non-finite coordinate, or a result that overflows on the original
 * scale) and `non-positive-log-argument` (a value <= 0 where the form takes its log; column = predictor,
 * row = point index, field `points`).
 */

import { studentTInverseSurvival } from './distributions';
import { EngineError } from './errors';
import { FunctionalForm, predictorTransformation, responseTransformation } from './functional-forms';
import { AnalysisError } from './diagnostics/analysis-error';
import { bilinear, SquareMatrix } from './diagnostics/small-matrix';
import { evaluateAtPoint, WorkingPredictionModel } from './working-coordinates';

export interface PredictionModel {
  /** Names of the values a point gives, in order: the predictors, or the distinct columns when `terms` is set. */
  predictorNames: string[];
  /**
   * Power terms: design entry k (after the intercept) is point[terms[k].column] ^ terms[k].power. Absent
   * when every predictor is a plain column (the point then gives one value per predictor).
   */
  terms?: { column: number; power: number }[];
  hasIntercept: boolean;
  /** Coefficients in design order (intercept first when present). */
  coefficients: ArrayLike<number>;
  /** Coefficient covariance on the model's scale (classical or robust). */
  covariance: SquareMatrix;
  /** sigma^2 = RSS / (n - p). */
  residualVariance: number;
  degreesOfFreedom: number;
  form: FunctionalForm;
  /** Duan's smearing factor of the log-scale residuals (log-y forms); null when not supplied. */
  smearingFactor?: number | null;
  /**
   * The fit in its working coordinates (working-coordinates.ts). When present, the estimate and its
   * variance are evaluated there, free of the offsets of the predictors; models stored before it existed
   * fall back to x0'b and x0' V x0.
   */
  working?: WorkingPredictionModel;
}

export interface Interval {
  lower: number;
  upper: number;
}

export interface Prediction {
  /** The point as given, by predictor name. */
  point: Record<string, number>;
  modelScale: {
    estimate: number;
    standardErrorOfMean: number;
    standardErrorOfPrediction: number;
    confidenceInterval: Interval;
    predictionInterval: Interval;
  };
  originalScale: {
    estimate: number;
    meanEstimate: number;
    smearedMeanEstimate: number | null;
    confidenceInterval: Interval;
    predictionInterval: Interval;
  } | null;
}

export interface PredictionResult {
  confidenceLevel: number;
  form: FunctionalForm;
  degreesOfFreedom: number;
  predictions: Prediction[];
}

export function predictAt(model: PredictionModel, points: unknown, confidenceLevel: number): PredictionResult {
  if (!Array.isArray(points) || points.length === 0) {
    throw new AnalysisError('predictor-count-mismatch', '"points" must be a non-empty list of predictor value lists.', {
      field: 'points',
    });
  }
  const k = model.predictorNames.length;
  const critical = studentTInverseSurvival((1 - confidenceLevel) / 2, model.degreesOfFreedom);
  const logPredictors = predictorTransformation(model.form) === 'natural-log';
  const logResponse = responseTransformation(model.form) === 'natural-log';
  const predictions = points.map((point: unknown, row): Prediction => {
    if (!Array.isArray(point) || point.length !== k) {
      const got = Array.isArray(point) ? point.length : 'no list';
      throw new AnalysisError(
        'predictor-count-mismatch',
        `Point ${row} (0-based) must give ${k} predictor values (${model.predictorNames.join(', ')}); got ${got}.`,
        { field: 'points', row },
      );
    }
    const values: number[] = [];
    const named: Record<string, number> = {};
    point.forEach((value: unknown, j: number) => {
      const name = model.predictorNames[j]!;
      if (typeof value !== 'number' || !Number.isFinite(value)) {
        throw new EngineError('non-finite-value', `Point ${row} (0-based) has a missing or non-finite value for "${name}".`, {
          column: name,
          row,
          field: 'points',
        });
      }
      if (logPredictors && !(value > 0)) {
        throw new EngineError(
          'non-positive-log-argument',
          `This form takes the natural log of "${name}", but point ${row} (0-based) gives ${value}, which is not positive.`,
          { column: name, row, field: 'points' },
        );
      }
      named[name] = value;
      values.push(logPredictors ? Math.log(value) : value);
    });
    const x: number[] = model.hasIntercept ? [1] : [];
    if (model.terms) for (const term of model.terms) x.push(Math.pow(values[term.column]!, term.power));
    else x.push(...values);
    if (!x.every(Number.isFinite)) {
      throw new EngineError('non-finite-value', `Point ${row} (0-based) raises a value to a power too large to represent.`, { row, field: 'points' });
    }
    let estimate = 0;
    let meanVariance = 0;
    if (model.working) {
      ({ estimate, variance: meanVariance } = evaluateAtPoint(model.working, x));
    } else {
      for (let j = 0; j < x.length; j++) estimate += x[j]! * model.coefficients[j]!;
      meanVariance = Math.max(0, bilinear(x, model.covariance, x));
    }
    const standardErrorOfMean = Math.sqrt(meanVariance);
    const standardErrorOfPrediction = Math.sqrt(model.residualVariance + meanVariance);
    const confidenceInterval = { lower: estimate - critical * standardErrorOfMean, upper: estimate + critical * standardErrorOfMean };
    const predictionInterval = {
      lower: estimate - critical * standardErrorOfPrediction,
      upper: estimate + critical * standardErrorOfPrediction,
    };
    return {
      point: named,
      modelScale: { estimate, standardErrorOfMean, standardErrorOfPrediction, confidenceInterval, predictionInterval },
      originalScale: logResponse ? backTransform(estimate, model.residualVariance, model.smearingFactor ?? null, confidenceInterval, predictionInterval, row) : null,
    };
  });
  return { confidenceLevel, form: model.form, degreesOfFreedom: model.degreesOfFreedom, predictions };
}

function backTransform(
  estimate: number,
  residualVariance: number,
  smearing: number | null,
  confidence: Interval,
  prediction: Interval,
  row: number,
): NonNullable<Prediction['originalScale']> {
  const result = {
    estimate: Math.exp(estimate),
    meanEstimate: Math.exp(estimate + residualVariance / 2),
    smearedMeanEstimate: smearing === null ? null : Math.exp(estimate) * smearing,
    confidenceInterval: { lower: Math.exp(confidence.lower), upper: Math.exp(confidence.upper) },
    predictionInterval: { lower: Math.exp(prediction.lower), upper: Math.exp(prediction.upper) },
  };
  const values = [result.estimate, result.meanEstimate, result.smearedMeanEstimate ?? 0, result.confidenceInterval.upper, result.predictionInterval.upper];
  if (!values.every(Number.isFinite)) {
    throw new EngineError('non-finite-value', `Point ${row} (0-based) predicts a value too large to represent on the original scale.`, {
      field: 'points',
      row,
    });
  }
  return result;
}
