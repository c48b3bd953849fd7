import { ApiProperty } from '@nestjs/swagger';
import { FUNCTIONAL_FORMS, FunctionalForm } from '../../engine/functional-forms';
import { IntervalDto } from './coefficient-estimate.dto';
import { CovarianceDescriptionDto } from './coefficient-inference.dto';
import { FORM_DESCRIPTION } from './fit-result.dto';

/** A prediction on the scale the model was fitted on (ln y for log-y forms). */
export class PredictionModelScaleDto {
  @ApiProperty({ type: Number, description: 'ŷ₀ = x₀′b, x₀ transformed as the form asks (ln x for lin-log and log-log).', example: 0.00609 })
  estimate: number;

  @ApiProperty({
    type: Number,
    description: '√(x₀′V x₀): standard error of the mean response at the point, V the covariance described in `covariance`.',
    example: 0.000134,
  })
  standardErrorOfMean: number;

  @ApiProperty({
    type: Number,
    description: '√(s² + x₀′V x₀), s² = RSS/(n − p): standard error for one new observation of weight 1.',
    example: 0.00145,
  })
  standardErrorOfPrediction: number;

  @ApiProperty({
    type: () => IntervalDto,
    description: 'estimate ∓ t_{df,(1+level)/2}·standardErrorOfMean: interval for the mean response.',
  })
  confidenceInterval: IntervalDto;

  @ApiProperty({
    type: () => IntervalDto,
    description: 'estimate ∓ t_{df,(1+level)/2}·standardErrorOfPrediction: interval for one new observation.',
  })
  predictionInterval: IntervalDto;
}

/** A log-y prediction carried back to the scale of y, assuming normal errors on the log scale. */
export class PredictionOriginalScaleDto {
  @ApiProperty({ type: Number, description: 'exp(ŷ₀): the conditional median of y.', example: 41.7 })
  estimate: number;

  @ApiProperty({ type: Number, description: 'exp(ŷ₀ + s²/2): the log-normal conditional mean of y.', example: 42.3 })
  meanEstimate: number;

  @ApiProperty({
    type: Number,
    nullable: true,
    description:
      'exp(ŷ₀)·S with Duan’s (1983) smearing factor S = mean of exp(residual) (weighted for a weighted fit): a ' +
      'distribution-free estimate of the mean of y. Null only when the model supplied no smearing factor.',
    example: 42.5,
  })
  smearedMeanEstimate: number | null;

  @ApiProperty({
    type: () => IntervalDto,
    description: 'exp of the model-scale confidence interval ends: an interval for the median of y.',
  })
  confidenceInterval: IntervalDto;

  @ApiProperty({
    type: () => IntervalDto,
    description: 'exp of the model-scale prediction interval ends: an exact prediction interval for a new y (exp is increasing).',
  })
  predictionInterval: IntervalDto;
}

/** One requested point and its predictions (engine: Prediction in prediction.ts). */
export class PredictionDto {
  @ApiProperty({
    type: 'object',
    additionalProperties: { type: 'number' },
    description: 'The point as given, on the original scale, keyed by predictor name.',
    example: { ticket_size: 48.5 },
  })
  point: Record<string, number>;

  @ApiProperty({ type: () => PredictionModelScaleDto, description: 'Estimate, standard errors and intervals on the model’s scale.' })
  modelScale: PredictionModelScaleDto;

  @ApiProperty({
    type: () => PredictionOriginalScaleDto,
    nullable: true,
    description: 'Log-y forms (log-lin, log-log) only: the same prediction on the scale of y. Null for the other forms.',
  })
  originalScale: PredictionOriginalScaleDto | null;
}

/** Predictions at new points from one fit (engine: PredictionResult in prediction.ts). */
export class PredictionResultDto {
  @ApiProperty({ type: Number, description: 'Level of every interval, strictly between 0 and 1.', example: 0.95 })
  confidenceLevel: number;

  @ApiProperty({ enum: FUNCTIONAL_FORMS, description: FORM_DESCRIPTION, example: 'lin-lin' })
  form: FunctionalForm;

  @ApiProperty({
    type: 'integer',
    description: 'Degrees of freedom of the t quantile in every interval: the covariance’s inference degrees of freedom (n − p, or G − 1 for cluster).',
    example: 198,
  })
  degreesOfFreedom: number;

  @ApiProperty({ type: [PredictionDto], description: 'One entry per requested point, in request order.' })
  predictions: PredictionDto[];
}

/** PredictionResultDto plus the covariance behind it, as the engine's predict() returns it. */
export class PredictionWithCovarianceDto extends PredictionResultDto {
  @ApiProperty({ type: () => CovarianceDescriptionDto, description: 'The coefficient covariance V behind every standard error.' })
  covariance: CovarianceDescriptionDto;
}
