/**
 * The one units rule, used for every billable call and shown in the docs:
 *
 *   units = models + ceil(observations / 10 000)
 *
 * where `models` is the number of least-squares models the call estimates (1 for a fit or a prediction
 * from an inline specification, the number of forms for a comparison, the number of responses for a
 * batch, and one per started block of 100 windows for a rolling fit) and `observations` is the number of
 * data rows used summed over those models (a rolling fit counts the series length once). Predictions from
 * a stored fit estimate nothing new: models = 0, observations = the number of prediction points.
 */
export const OBSERVATIONS_PER_UNIT = 10_000;
export const WINDOWS_PER_MODEL_UNIT = 100;

export interface BillableWork {
  models: number;
  observations: number;
}

export function billableUnits(work: BillableWork): number {
  if (!Number.isInteger(work.models) || work.models < 0) throw new Error('models must be a non-negative integer');
  if (!Number.isFinite(work.observations) || work.observations < 0) throw new Error('observations must be non-negative');
  return Math.max(1, work.models + Math.ceil(work.observations / OBSERVATIONS_PER_UNIT));
}

export function rollingModels(windows: number): number {
  return Math.ceil(windows / WINDOWS_PER_MODEL_UNIT);
}
