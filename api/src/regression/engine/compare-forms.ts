/**
 * compareForms: fit every functional form the data allow and rank them on criteria that are
 * comparable although the response is transformed in some forms and not in others.
 *
 * Criteria, all on the scale of y:
 *   aic, bic, logLikelihood   for ln-y forms the Jacobian-adjusted values (log-likelihood - sum ln y_i,
 *                             see information-criteria.ts); for y forms the ordinary ones.
 *   rSquared                  1 - sum w (y - yhat)^2 / total, with yhat back-transformed by Duan's
 *                             smearing for ln-y forms (centred total with an intercept, uncentred
 *                             without). It can be negative for a back-transformed fit.
 *   residualStandardError     sqrt(sum w (y - yhat)^2 / (n - p)) with the same yhat.
 * The ranking is by AIC (lower is better; a perfect fit, whose AIC is undefined, ranks first); ranks on
 * the other criteria are reported beside it. A form the data do not allow (a log of a non-positive
 * value) or that fails on the transformed data (for example predictors that become collinear after
 * taking logs) is listed under `skipped` with the engine error that stopped it.
 */

import { EngineError, EngineErrorCode, isEngineError } from './errors';
import { FitInput, validateFitInput } from './fit-input';
import { FitResult, fitValidated } from './fit-model';
import { FUNCTIONAL_FORMS, FunctionalForm, predictorTransformation, responseTransformation } from './functional-forms';
import { INTERCEPT_NAME } from './least-squares';

export interface FormCriteria {
  form: FunctionalForm;
  /** 1 = best, by AIC on the scale of y. */
  rank: number;
  logLikelihood: number | null;
  aic: number | null;
  bic: number | null;
  rSquared: number;
  residualStandardError: number;
  ranks: { aic: number; bic: number; rSquared: number; residualStandardError: number };
}

export interface SkippedForm {
  form: FunctionalForm;
  code: EngineErrorCode;
  message: string;
  column?: string;
  row?: number;
}

export interface FormComparison {
  rankedBy: 'aic';
  /** Sorted best first. */
  criteria: FormCriteria[];
  fits: Partial<Record<FunctionalForm, FitResult>>;
  skipped: SkippedForm[];
}

export type CompareFormsInput = Omit<FitInput, 'form'> & { forms?: FunctionalForm[] };

export function compareForms(input: CompareFormsInput): FormComparison {
  const forms = input.forms ?? [...FUNCTIONAL_FORMS];
  const validated = forms.map((form) => validateFitInput({ ...withoutForms(input), form }, { deferFiniteCheck: true }));
  const base = validated[0];
  if (!base) {
    throw new EngineError('invalid-argument', '"forms" must list at least one functional form.', { field: 'forms' });
  }
  const fits: Partial<Record<FunctionalForm, FitResult>> = {};
  const skipped: SkippedForm[] = [];
  const rows: Omit<FormCriteria, 'rank' | 'ranks'>[] = [];
  for (const formInput of validated) {
    const form = formInput.form;
    try {
      const fit = fitValidated(formInput);
      fits[form] = fit;
      rows.push(criteriaOf(fit, formInput.response.values, formInput.predictors.map((p) => p.values), formInput.weights?.values ?? null));
    } catch (error) {
      if (!isEngineError(error)) throw error;
      skipped.push({
        form,
        code: error.code,
        message: error.message,
        ...(error.column !== undefined ? { column: error.column } : {}),
        ...(error.row !== undefined ? { row: error.row } : {}),
      });
    }
  }
  if (rows.length === 0) {
    const first = skipped[0];
    throw new EngineError(
      'no-form-fits',
      `None of the requested forms can be fitted to these data${first ? `: ${first.form}: ${first.message}` : ''}.`,
      { ...(first?.column !== undefined ? { column: first.column } : {}), ...(first?.row !== undefined ? { row: first.row } : {}) },
    );
  }
  const rankOf = (key: (row: Omit<FormCriteria, 'rank' | 'ranks'>) => number) => {
    const order = rows.map((row, index) => ({ index, value: key(row) })).sort((a, b) => a.value - b.value || a.index - b.index);
    const ranks = new Array<number>(rows.length);
    order.forEach((entry, position) => (ranks[entry.index] = position + 1));
    return ranks;
  };
  const aicRanks = rankOf((row) => row.aic ?? -Infinity);
  const bicRanks = rankOf((row) => row.bic ?? -Infinity);
  const rSquaredRanks = rankOf((row) => -row.rSquared);
  const errorRanks = rankOf((row) => row.residualStandardError);
  const criteria: FormCriteria[] = rows.map((row, index) => ({
    ...row,
    rank: aicRanks[index]!,
    ranks: {
      aic: aicRanks[index]!,
      bic: bicRanks[index]!,
      rSquared: rSquaredRanks[index]!,
      residualStandardError: errorRanks[index]!,
    },
  }));
  criteria.sort((a, b) => a.rank - b.rank);
  return { rankedBy: 'aic', criteria, fits, skipped };
}

function withoutForms(input: CompareFormsInput): Omit<FitInput, 'form'> {
  const copy: CompareFormsInput = { ...input };
  delete copy.forms;
  return copy;
}

function criteriaOf(
  fit: FitResult,
  response: Float64Array,
  predictors: Float64Array[],
  weights: Float64Array | null,
): Omit<FormCriteria, 'rank' | 'ranks'> {
  const n = response.length;
  const logResponse = responseTransformation(fit.form) === 'natural-log';
  const logPredictors = predictorTransformation(fit.form) === 'natural-log';
  const factor = fit.originalScale?.smearingFactor ?? 1;
  const slopes = fit.coefficients.filter((c) => c.term !== INTERCEPT_NAME || !fit.intercept).map((c) => c.estimate);
  const constant = fit.intercept ? (fit.coefficients[0]?.estimate ?? 0) : 0;
  let weightSum = 0;
  let mean = 0;
  if (fit.intercept) {
    for (let i = 0; i < n; i++) {
      const w = weights ? weights[i]! : 1;
      weightSum += w;
      mean += w * response[i]!;
    }
    mean /= weightSum;
  }
  let errorSquares = 0;
  let totalSquares = 0;
  for (let i = 0; i < n; i++) {
    let linear = constant;
    for (let j = 0; j < slopes.length; j++) {
      const x = (predictors[j] as Float64Array)[i]!;
      linear += slopes[j]! * (logPredictors ? Math.log(x) : x);
    }
    const prediction = logResponse ? Math.exp(linear) * factor : linear;
    const w = weights ? weights[i]! : 1;
    const error = response[i]! - prediction;
    const deviation = response[i]! - mean;
    errorSquares += w * error * error;
    totalSquares += w * deviation * deviation;
  }
  const scaleCriteria = logResponse
    ? {
        logLikelihood: fit.originalScale?.logLikelihood ?? null,
        aic: fit.originalScale?.aic ?? null,
        bic: fit.originalScale?.bic ?? null,
      }
    : {
        logLikelihood: fit.informationCriteria.logLikelihood,
        aic: fit.informationCriteria.aic,
        bic: fit.informationCriteria.bic,
      };
  return {
    form: fit.form,
    ...scaleCriteria,
    rSquared: 1 - errorSquares / totalSquares,
    residualStandardError: Math.sqrt(errorSquares / (n - fit.coefficientCount)),
  };
}
