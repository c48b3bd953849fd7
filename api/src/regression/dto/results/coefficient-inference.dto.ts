import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { COVARIANCE_TYPES, CovarianceType } from '../../engine/covariance';
import { IntervalDto } from './coefficient-estimate.dto';

/** Which coefficient covariance V the inference used (engine: CovarianceDescription in covariance.ts). */
export class CovarianceDescriptionDto {
  @ApiProperty({
    enum: COVARIANCE_TYPES,
    description:
      'With C = (X′WX)⁻¹ and scores u_i = w_i e_i x_i: classical s²C, s² = RSS/(n − p). hc0: C[Σ u_i u_i′]C (White 1980). ' +
      'hc1: hc0 × n/(n − p). hc2: each u_i u_i′ divided by 1 − h_i. hc3: divided by (1 − h_i)² (MacKinnon & White 1985). ' +
      'newey-west: C S C with S the Bartlett-weighted sum of score autocovariances up to lag L, rows in time order ' +
      '(Newey & West 1987). cluster: CR1, C[Σ_g s_g s_g′]C × G/(G − 1)·(n − 1)/(n − p) with s_g the summed scores of group g.',
    example: 'hc1',
  })
  type: CovarianceType;

  @ApiProperty({
    type: 'integer',
    nullable: true,
    description:
      'newey-west only: the lag L (weights 1 − l/(L + 1), l = 1…L). Automatic rule: L = floor(4·(n/100)^(2/9)) ' +
      '(Newey & West 1994), at most n − 1. Null for other types.',
    example: null,
  })
  lag: number | null;

  @ApiProperty({
    enum: ['fixed', 'automatic'],
    nullable: true,
    description: 'newey-west only: whether L was given (fixed) or chosen by the automatic rule. Null for other types.',
    example: null,
  })
  lagRule: 'fixed' | 'automatic' | null;

  @ApiProperty({
    enum: ['bartlett'],
    nullable: true,
    description: 'newey-west only: the lag-weight kernel (Bartlett). Null for other types.',
    example: null,
  })
  kernel: 'bartlett' | null;

  @ApiProperty({
    type: 'integer',
    nullable: true,
    description: 'cluster only: G, the number of distinct group labels (at least 2). Null for other types.',
    example: null,
  })
  clusterCount: number | null;

  @ApiProperty({
    type: Number,
    description:
      'Factor the covariance was multiplied by: n/(n − p) for hc1, and for newey-west when the small-sample correction ' +
      'was requested (none by default); G/(G − 1)·(n − 1)/(n − p) for cluster; 1 otherwise.',
    example: 1.0101,
  })
  smallSampleFactor: number;

  @ApiProperty({
    type: 'integer',
    description: 'Degrees of freedom of every t and F reference distribution: n − p, or G − 1 for cluster.',
    example: 198,
  })
  inferenceDegreesOfFreedom: number;
}

/** One coefficient under the chosen covariance V (engine: CoefficientRow in covariance-inference.ts). */
export class CoefficientRowDto {
  @ApiProperty({
    description: 'Coefficient name: "(intercept)" for the constant (first when present), otherwise the predictor column name.',
    example: 'ticket_size',
  })
  term: string;

  @ApiProperty({ type: Number, description: 'Least-squares coefficient b_j on the model’s scale.', example: 0.0000812 })
  estimate: number;

  @ApiProperty({
    type: Number,
    description: '√V_jj under the covariance described in `covariance`, in the units of the estimate.',
    example: 0.0000093,
  })
  standardError: number;

  @ApiProperty({
    type: Number,
    nullable: true,
    description: 'b_j / standardError; null when the standard error is 0 (an exact fit).',
    example: 8.73,
  })
  tStatistic: number | null;

  @ApiProperty({
    type: Number,
    nullable: true,
    description: 'Two-sided P(|T| ≥ |t|), T ~ Student’s t on inferenceDegreesOfFreedom; null when tStatistic is null.',
    example: 1.2e-15,
  })
  pValue: number | null;

  @ApiProperty({
    type: () => IntervalDto,
    description: 'b_j ∓ t_{df,(1+level)/2}·standardError, df = inferenceDegreesOfFreedom, at confidenceLevel.',
  })
  confidenceInterval: IntervalDto;
}

/** Joint test that the slopes are 0 under the chosen covariance (engine: WaldTest). */
export class WaldTestDto {
  @ApiProperty({
    type: [String],
    description: 'Terms tested jointly against 0: every slope, or every coefficient when the model has no intercept.',
    example: ['ticket_size'],
  })
  terms: string[];

  @ApiProperty({
    type: Number,
    description:
      'F = (Rb)′(RVR′)⁻¹(Rb)/q, R selecting the q tested coefficients. With the classical covariance this equals the ' +
      'analysis-of-variance F.',
    example: 76.2,
  })
  statistic: number;

  @ApiProperty({ type: 'integer', description: 'q, the number of tested terms.', example: 1 })
  numeratorDegreesOfFreedom: number;

  @ApiProperty({
    type: 'integer',
    description: 'The covariance’s inference degrees of freedom: n − p, or G − 1 for cluster.',
    example: 198,
  })
  denominatorDegreesOfFreedom: number;

  @ApiProperty({ type: Number, description: 'Upper-tail probability of statistic under F(q, denominator df).', example: 1.2e-15 })
  pValue: number;
}

/**
 * The coefficient table and joint test under a chosen covariance (engine: CoefficientInference);
 * AnalysisResultDto extends it with the sample sizes and the assumption checks.
 */
export class CoefficientInferenceDto {
  @ApiProperty({ type: () => CovarianceDescriptionDto, description: 'The coefficient covariance the table and test use.' })
  covariance: CovarianceDescriptionDto;

  @ApiProperty({ type: Number, description: 'Level of every confidence interval, strictly between 0 and 1.', example: 0.95 })
  confidenceLevel: number;

  @ApiProperty({ type: [CoefficientRowDto], description: 'One row per coefficient, in design order (intercept first when present).' })
  coefficients: CoefficientRowDto[];

  @ApiProperty({
    type: () => WaldTestDto,
    nullable: true,
    description:
      'Wald F-test that every slope is 0. Null when RVR′ is not positive definite, for example a cluster covariance ' +
      'with more tested terms than G − 1, or a perfect fit.',
  })
  waldTest: WaldTestDto | null;

  @ApiPropertyOptional({
    type: 'array',
    items: { type: 'number', nullable: true },
    description:
      'Upper bound on the relative error of each standard error above, for the numbers sent (see fit.numerics.accuracy); ' +
      'null entries where no bound is claimed (very ill-conditioned designs, or sandwich covariances of problems with ' +
      'n·p² above 4e6, summed in working coordinates).',
    example: [6.7e-16, 6.7e-16],
  })
  standardErrorAccuracy?: (number | null)[];
}
