import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { EffectUnit, Transformation } from '../../engine/functional-forms';
import { LeastSquaresMethod } from '../../engine/least-squares';
import { IntervalDto } from './coefficient-estimate.dto';

const TRANSFORMATIONS: readonly Transformation[] = ['none', 'natural-log'];

const EFFECT_UNITS: readonly EffectUnit[] = [
  'response-units-per-predictor-unit',
  'percent-per-predictor-unit',
  'response-units-per-percent',
  'percent-per-percent',
];

const FIT_METHODS: readonly (LeastSquaresMethod | 'straight-line')[] = ['householder-refined', 'tall-skinny', 'straight-line'];

/** How the form transformed the data before fitting. */
export class FitTransformationsDto {
  @ApiProperty({
    enum: TRANSFORMATIONS,
    description: 'natural-log for log-lin and log-log (the model explains ln y); none otherwise.',
    example: 'none',
  })
  response: Transformation;

  @ApiProperty({
    enum: TRANSFORMATIONS,
    description: 'natural-log for lin-log and log-log (every predictor enters as ln x); none otherwise.',
    example: 'none',
  })
  predictors: Transformation;
}

/** A slope read in the units its functional form gives it (engine: CoefficientEffect). */
export class CoefficientEffectDto {
  @ApiProperty({ description: 'Predictor column name.', example: 'ticket_size' })
  term: string;

  @ApiProperty({
    enum: EFFECT_UNITS,
    description:
      'response-units-per-predictor-unit (lin-lin), percent-per-predictor-unit (log-lin), ' +
      'response-units-per-percent (lin-log: change in y for a 1% rise in x), percent-per-percent (log-log).',
    example: 'response-units-per-predictor-unit',
  })
  unit: EffectUnit;

  @ApiProperty({
    type: Number,
    description:
      'The exact effect of the slope b: lin-lin b; log-lin 100(eᵇ − 1) % per unit of x; lin-log b·ln(1.01) per 1% rise ' +
      'in x; log-log 100(1.01ᵇ − 1) % for a 1% rise in x.',
    example: 0.0000812,
  })
  value: number;

  @ApiProperty({
    type: Number,
    description:
      'The usual linear approximation of value: lin-lin b (equal to value); log-lin 100b; lin-log b/100; log-log b (the elasticity).',
    example: 0.0000812,
  })
  approximation: number;

  @ApiProperty({
    type: Number,
    nullable: true,
    description: 'log-log only: the elasticity b (% change in y per 1% change in x). Null for the other forms.',
    example: null,
  })
  elasticity: number | null;

  @ApiProperty({
    type: () => IntervalDto,
    description:
      'value evaluated at the two ends of the coefficient’s confidence interval (every map above is increasing in b), ' +
      'in the same unit as value.',
  })
  confidenceInterval: IntervalDto;

  @ApiProperty({
    description: 'One sentence saying how to read value for this predictor and form.',
    example: 'Change in the response for a one-unit increase in ticket_size.',
  })
  description: string;
}

/** A log-y fit seen on the scale of y itself (engine: OriginalScaleSummary). */
export class OriginalScaleSummaryDto {
  @ApiProperty({
    type: Number,
    description:
      'Duan’s (1983) smearing factor S = mean of exp(residual) on the log scale (weighted mean Σ w_i e^{r_i} / Σ w_i for a ' +
      'weighted fit). exp(x′b)·S estimates the mean of y; exp(x′b) alone estimates its median.',
    example: 1.0214,
  })
  smearingFactor: number;

  @ApiProperty({
    type: Number,
    nullable: true,
    description:
      'Log-likelihood of y itself: the ln-y log-likelihood minus Σ ln y_i (the Jacobian of y → ln y). Comparable with a ' +
      'model of untransformed y fitted to the same rows. Null for a perfect fit.',
    example: 1342.8,
  })
  logLikelihood: number | null;

  @ApiProperty({
    type: Number,
    nullable: true,
    description: 'AIC of y itself: −2·logLikelihood + 2k (k = p + 1, σ counted), i.e. the ln-y AIC + 2·Σ ln y_i. Null for a perfect fit.',
    example: -2679.6,
  })
  aic: number | null;

  @ApiProperty({
    type: Number,
    nullable: true,
    description: 'BIC of y itself: −2·logLikelihood + k·ln n, i.e. the ln-y BIC + 2·Σ ln y_i. Null for a perfect fit.',
    example: -2669.7,
  })
  bic: number | null;
}

/** Per-observation results, in row order (engine: ObservationResults). */
export class ObservationResultsDto {
  @ApiProperty({ type: [Number], description: 'Fitted values ŷ_i = x_i′b on the model’s scale (ln y for log-y forms).' })
  fitted: number[];

  @ApiProperty({
    type: [Number],
    description: 'Residuals y_i − ŷ_i on the model’s scale, not multiplied by √w_i for a weighted fit.',
  })
  residuals: number[];

  @ApiProperty({
    type: [Number],
    description: 'Leverage h_i: the diagonal of the hat matrix W^½X(X′WX)⁻¹X′W^½, between 0 and 1.',
  })
  leverage: number[];

  @ApiProperty({
    type: 'array',
    items: { type: 'number', nullable: true },
    description:
      'Internally studentised residuals e_i / (s·√(1 − h_i)), with e_i = √w_i (y_i − ŷ_i). Null where undefined: ' +
      'h_i = 1 (within 1e-10) or s = 0.',
  })
  standardisedResiduals: (number | null)[];

  @ApiProperty({
    type: 'array',
    items: { type: 'number', nullable: true },
    description:
      'Externally studentised residuals e_i / (s_(i)·√(1 − h_i)) with the leave-one-out s_(i)² = (RSS − e_i²/(1 − h_i)) / ' +
      '(n − p − 1). Null where h_i = 1, s = 0, n − p − 1 = 0 or s_(i)² is not positive.',
  })
  studentisedResiduals: (number | null)[];

  @ApiProperty({
    type: 'array',
    items: { type: 'number', nullable: true },
    description: 'Cook’s distance e_i²·h_i / (p·s²·(1 − h_i)²). Null where h_i = 1 or s = 0.',
  })
  cooksDistance: (number | null)[];

  @ApiPropertyOptional({
    type: [Number],
    description: 'Log-y forms only: exp(ŷ_i), an estimate of the median of y_i on its original scale.',
  })
  fittedOriginalScaleNaive?: number[];

  @ApiPropertyOptional({
    type: [Number],
    description: 'Log-y forms only: exp(ŷ_i) times Duan’s smearing factor, an estimate of the mean of y_i on its original scale.',
  })
  fittedOriginalScaleSmeared?: number[];
}

/** How the solve was carried out. */
export class FitNumericsDto {
  @ApiProperty({
    enum: FIT_METHODS,
    description:
      'householder-refined: Householder QR of the centred, power-of-two-scaled design with iterative refinement in ' +
      'double-double. tall-skinny: blocked tall-skinny QR, used when n·p > 2²¹ (a tall problem whose condition number ' +
      'exceeds 1e4 is handed to the refined solver and reported as householder-refined). straight-line: one predictor ' +
      'with an intercept and no weights, solved from one pass of shifted sums.',
    example: 'straight-line',
  })
  method: LeastSquaresMethod | 'straight-line';

  @ApiProperty({
    type: Number,
    nullable: true,
    description:
      'Frobenius-norm condition number of the working design the solver factorised (centred for an intercept model, ' +
      'columns scaled by powers of two). It describes the solve, not the caller’s columns: see the collinearity check ' +
      'for the scaled, uncentred condition number. Null on the straight-line path.',
    example: null,
  })
  conditionNumber: number | null;

  @ApiProperty({
    type: 'integer',
    description: 'Iterative-refinement steps taken for the coefficients; 0 on the straight-line and tall-skinny paths.',
    example: 0,
  })
  refinementSteps: number;

  @ApiProperty({
    type: () => AccuracyReportDto,
    nullable: true,
    description:
      'How exact this answer is: a bound on the relative error of every coefficient and classical standard error, ' +
      'computed after the fact from the answer itself. Null on the single-pass straight-line path (one predictor, ' +
      'more than 100,000 rows).',
  })
  accuracy: AccuracyReportDto | null;
}

/** A-posteriori relative error bounds, one per coefficient in design order. */
export class AccuracyReportDto {
  @ApiProperty({
    type: 'array',
    items: { type: 'number', nullable: true },
    description:
      'Upper bound on |reported − exact| / |exact| for each coefficient, where "exact" is the least-squares solution ' +
      'for the very numbers sent. From the double-double residual of the reported coefficients and the working ' +
      'covariance; null when the working problem is too ill-conditioned (condition number above about 9e12) to claim one.',
    example: [2.4e-16, 1.2e-16],
  })
  coefficients: (number | null)[];

  @ApiProperty({
    type: 'array',
    items: { type: 'number', nullable: true },
    description: 'The same bound for each standard error of the table it accompanies.',
    example: [4.4e-16, 4.4e-16],
  })
  standardErrors: (number | null)[];
}
