/**
 * The four functional forms, named response-scale first:
 *   lin-lin  y    on x         coefficient b: change in y per unit of x
 *   log-lin  ln y on x         exact percentage change in y per unit of x: 100 (e^b - 1); approximation 100 b
 *   lin-log  y    on ln x      change in y for a 1% rise in x: b ln(1.01); approximation b / 100
 *   log-log  ln y on ln x      elasticity b (% change in y per 1% change in x); exact: 100 (1.01^b - 1)
 * Logs are natural logs. Every predictor is transformed the same way.
 */

import { EngineError } from './errors';
import { assertFinite } from './finite-values';

export const FUNCTIONAL_FORMS = ['lin-lin', 'log-lin', 'lin-log', 'log-log'] as const;
export type FunctionalForm = (typeof FUNCTIONAL_FORMS)[number];

export type Transformation = 'none' | 'natural-log';

export function responseTransformation(form: FunctionalForm): Transformation {
  return form === 'log-lin' || form === 'log-log' ? 'natural-log' : 'none';
}

export function predictorTransformation(form: FunctionalForm): Transformation {
  return form === 'lin-log' || form === 'log-log' ? 'natural-log' : 'none';
}

/**
 * The column on the model's scale: the values themselves, or their natural logs. Raises
 * `non-positive-log-argument` naming the column and the first row (0-based) whose value is <= 0
 * (and `non-finite-value` for NaN or Infinity met on the way).
 */
export function transformColumn(name: string, values: Float64Array, transformation: Transformation): Float64Array {
  if (transformation === 'none') return values;
  const n = values.length;
  const result = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const value = values[i]!;
    if (!Number.isFinite(value)) assertFinite(name, values);
    if (!(value > 0)) {
      throw new EngineError(
        'non-positive-log-argument',
        `Column "${name}" needs a natural log for this form, but row ${i} (0-based) holds ${value}, which is not positive.`,
        { column: name, row: i },
      );
    }
    result[i] = Math.log(value);
  }
  return result;
}

/** First row (0-based) with a value <= 0, or -1. */
export function firstNonPositiveRow(values: Float64Array): number {
  for (let i = 0; i < values.length; i++) if (!(values[i]! > 0)) return i;
  return -1;
}

export type EffectUnit =
  | 'response-units-per-predictor-unit'
  | 'percent-per-predictor-unit'
  | 'response-units-per-percent'
  | 'percent-per-percent';

export interface CoefficientEffect {
  /** Predictor column name. */
  term: string;
  unit: EffectUnit;
  /** The effect read the way the form is interpreted (see the file comment). */
  value: number;
  /** The usual linear approximation of `value` (equal to it for lin-lin). */
  approximation: number;
  /** For log-log, the elasticity b itself; for other forms, null. */
  elasticity: number | null;
  /** The effect at the ends of the coefficient's confidence interval (the maps are increasing in b). */
  confidenceInterval: { lower: number; upper: number };
  description: string;
}

const ONE_PERCENT_LOG = Math.log1p(0.01);

/** The practitioner's reading of a slope b under `form`. */
export function effectValue(form: FunctionalForm, b: number): { value: number; approximation: number } {
  switch (form) {
    case 'lin-lin':
      return { value: b, approximation: b };
    case 'log-lin':
      return { value: 100 * Math.expm1(b), approximation: 100 * b };
    case 'lin-log':
      return { value: b * ONE_PERCENT_LOG, approximation: b / 100 };
    case 'log-log':
      return { value: 100 * Math.expm1(b * ONE_PERCENT_LOG), approximation: b };
  }
}

export function coefficientEffect(
  form: FunctionalForm,
  term: string,
  estimate: number,
  interval: { lower: number; upper: number },
): CoefficientEffect {
  const { value, approximation } = effectValue(form, estimate);
  const lower = effectValue(form, interval.lower).value;
  const upper = effectValue(form, interval.upper).value;
  const units: Record<FunctionalForm, EffectUnit> = {
    'lin-lin': 'response-units-per-predictor-unit',
    'log-lin': 'percent-per-predictor-unit',
    'lin-log': 'response-units-per-percent',
    'log-log': 'percent-per-percent',
  };
  const descriptions: Record<FunctionalForm, string> = {
    'lin-lin': `Change in the response for a one-unit increase in ${term}.`,
    'log-lin': `Percentage change in the response for a one-unit increase in ${term}: 100(e^b - 1); approximation 100b.`,
    'lin-log': `Change in the response for a 1% increase in ${term}: b ln(1.01); approximation b/100.`,
    'log-log': `Percentage change in the response for a 1% increase in ${term}: 100(1.01^b - 1); the elasticity b is the approximation.`,
  };
  return {
    term,
    unit: units[form],
    value,
    approximation,
    elasticity: form === 'log-log' ? estimate : null,
    confidenceInterval: { lower, upper },
    description: descriptions[form],
  };
}
