import { ApiProperty } from '@nestjs/swagger';

/** One line of the analysis-of-variance table (engine: AnovaLine in anova.ts). */
export class AnovaLineDto {
  @ApiProperty({ type: 'integer', description: 'Degrees of freedom of this line.', example: 198 })
  degreesOfFreedom: number;

  @ApiProperty({
    type: Number,
    description: 'Sum of squares on the model’s scale (weighted by w_i for a weighted fit), accumulated in double-double.',
    example: 0.000412,
  })
  sumOfSquares: number;

  @ApiProperty({ type: Number, description: 'sumOfSquares / degreesOfFreedom.', example: 0.00000208 })
  meanSquare: number;
}

/**
 * The analysis-of-variance table and the overall F-test (engine: AnovaTable in anova.ts). With an
 * intercept the total is centred; without one it is uncentred, and the degrees of freedom shift by one.
 */
export class AnovaTableDto {
  @ApiProperty({
    type: () => AnovaLineDto,
    description:
      'Explained line: sum of squares = total − residual; p − 1 degrees of freedom with an intercept, p without one.',
  })
  regression: AnovaLineDto;

  @ApiProperty({
    type: () => AnovaLineDto,
    description:
      'Residual line: RSS = Σ w_i (y_i − ŷ_i)² (w_i = 1 without weights) on n − p degrees of freedom; its mean square is s².',
  })
  residual: AnovaLineDto;

  @ApiProperty({
    type: () => AnovaLineDto,
    description:
      'Total line: Σ w_i (y_i − ȳ_w)² on n − 1 degrees of freedom with an intercept; the uncentred Σ w_i y_i² on n degrees ' +
      'of freedom without one. Its mean square is total sum of squares / total degrees of freedom.',
  })
  total: AnovaLineDto;

  @ApiProperty({
    type: Number,
    nullable: true,
    description:
      'Regression mean square / residual mean square: the joint test that every slope (every coefficient, for a model ' +
      'without an intercept) is 0. Null when RSS is 0 (perfect fit).',
    example: 100.4,
  })
  fStatistic: number | null;

  @ApiProperty({
    type: Number,
    nullable: true,
    description: 'Upper-tail probability of fStatistic under F(regression df, residual df); null when fStatistic is null.',
    example: 3.4e-19,
  })
  fPValue: number | null;
}

/** Gaussian log-likelihood, AIC and BIC on the model's scale (engine: InformationCriteria). */
export class InformationCriteriaDto {
  @ApiProperty({
    type: Number,
    nullable: true,
    description:
      'Maximised normal log-likelihood −n/2·(ln 2π + ln(RSS/n) + 1) + ½·Σ ln w_i, with σ² estimated by RSS/n (the ' +
      'maximum-likelihood estimate) and the weight term present only for a weighted fit. On the model’s scale: for a ' +
      'log-y form it is the likelihood of ln y (see originalScale for y itself). Null for a perfect fit, where it is unbounded.',
    example: 1016.3,
  })
  logLikelihood: number | null;

  @ApiProperty({
    type: Number,
    nullable: true,
    description: '−2·logLikelihood + 2k with k = parameterCount. Lower is better. Null for a perfect fit.',
    example: -2026.6,
  })
  aic: number | null;

  @ApiProperty({
    type: Number,
    nullable: true,
    description: '−2·logLikelihood + k·ln n with k = parameterCount. Lower is better. Null for a perfect fit.',
    example: -2016.7,
  })
  bic: number | null;

  @ApiProperty({
    type: 'integer',
    description: 'k = p + 1: the coefficients (intercept included) plus one for the error standard deviation σ.',
    example: 3,
  })
  parameterCount: number;
}
