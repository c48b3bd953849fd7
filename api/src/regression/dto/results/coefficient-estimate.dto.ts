import { ApiProperty } from '@nestjs/swagger';

/** A closed interval; the property that holds it says what it covers and at which level. */
export class IntervalDto {
  @ApiProperty({ type: Number, description: 'Lower end.', example: 0.0000651 })
  lower: number;

  @ApiProperty({ type: Number, description: 'Upper end.', example: 0.0000973 })
  upper: number;
}

/**
 * One row of a fit's coefficient table under the classical covariance s²(X′WX)⁻¹
 * (engine: CoefficientEstimate in coefficient-inference.ts).
 */
export class CoefficientEstimateDto {
  @ApiProperty({
    description: 'Coefficient name: "(intercept)" for the constant (always first when present), otherwise the predictor column name.',
    example: 'ticket_size',
  })
  term: string;

  @ApiProperty({
    type: Number,
    description:
      'Least-squares coefficient b_j on the model’s scale: per unit of x for lin-lin, a slope of ln y for log-lin, ' +
      'per unit of ln x for lin-log, an elasticity for log-log. See `effects` for the practitioner’s reading.',
    example: 0.0000812,
  })
  estimate: number;

  @ApiProperty({
    type: Number,
    description: 's·√[(X′WX)⁻¹]_jj with s² = RSS/(n − p), in the units of the estimate; 0 for a perfect fit.',
    example: 0.0000081,
  })
  standardError: number;

  @ApiProperty({
    type: Number,
    nullable: true,
    description: 'b_j / standardError, referred to Student’s t with n − p degrees of freedom; null when the standard error is 0 (perfect fit).',
    example: 10.02,
  })
  tStatistic: number | null;

  @ApiProperty({
    type: Number,
    nullable: true,
    description:
      'Two-sided P(|T| ≥ |t|), T ~ t(n − p), computed from one tail and doubled so values down to about 1e-308 keep their ' +
      'relative accuracy; null when tStatistic is null.',
    example: 3.4e-19,
  })
  pValue: number | null;

  @ApiProperty({
    type: () => IntervalDto,
    description:
      'b_j ∓ t_{(1+level)/2, n−p}·standardError at the fit’s confidenceLevel, in the units of the estimate; both ends equal ' +
      'the estimate for a perfect fit.',
  })
  confidenceInterval: IntervalDto;
}
