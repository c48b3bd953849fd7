import { ApiProperty } from '@nestjs/swagger';
import { FUNCTIONAL_FORMS, FunctionalForm } from '../../engine/functional-forms';
import { FORM_DESCRIPTION } from './fit-result.dto';

/** One coefficient across the windows (engine: CoefficientPath in rolling-fit.ts). */
export class CoefficientPathDto {
  @ApiProperty({ description: 'Coefficient name: "(intercept)" or a predictor column name.', example: 'ticket_size' })
  term: string;

  @ApiProperty({ type: [Number], description: 'Least-squares estimate in each window, on the model’s scale, in window order.' })
  estimates: number[];

  @ApiProperty({
    type: [Number],
    description:
      'Classical standard error in each window: from s²·C_xx⁻¹ for slopes and s²·(1/window + x̄′C_xx⁻¹x̄) for the intercept, ' +
      's² = RSS/(windowLength − p).',
  })
  standardErrors: number[];
}

/** Least squares over a sliding window of a time-ordered series (engine: RollingFitResult). */
export class RollingFitResultDto {
  @ApiProperty({ enum: FUNCTIONAL_FORMS, description: FORM_DESCRIPTION, example: 'lin-lin' })
  form: FunctionalForm;

  @ApiProperty({ type: 'integer', description: 'Rows per window.', example: 60 })
  windowLength: number;

  @ApiProperty({ type: 'integer', description: 'Rows the window moves each time.', example: 5 })
  step: number;

  @ApiProperty({ type: 'integer', description: 'Number of windows: floor((n − windowLength)/step) + 1.', example: 29 })
  windowCount: number;

  @ApiProperty({
    type: 'integer',
    isArray: true,
    description: 'First row (0-based) of each window; window w covers rows [windowStart[w], windowStart[w] + windowLength).',
    example: [0, 5, 10],
  })
  windowStart: number[];

  @ApiProperty({ type: [CoefficientPathDto], description: 'One path per coefficient, in design order ("(intercept)" first when present).' })
  coefficientPath: CoefficientPathDto[];

  @ApiProperty({ type: [Number], description: 's = √(RSS/(windowLength − p)) in each window, on the model’s scale.' })
  residualStandardError: number[];

  @ApiProperty({
    type: [Number],
    description: '1 − RSS/total in each window: total centred about the window mean with an intercept, uncentred without one.',
  })
  rSquared: number[];

  @ApiProperty({
    enum: ['updating-cross-products'],
    description:
      'Cross-product sums updated as rows enter and leave, about an anchor recomputed periodically (shifted-data algorithm), ' +
      'then each window’s centred normal equations solved by Cholesky.',
    example: 'updating-cross-products',
  })
  method: 'updating-cross-products';

  @ApiProperty({
    type: 'integer',
    description:
      'Windows solved again by the single-fit path (Householder QR with double-double refinement) because their predictors ' +
      'were ill-conditioned (condition number above about 1e3) or their fit nearly exact (1 − R² below 1e-6), where the ' +
      'updating normal equations would lose digits. Every window meets the single fit’s accuracy either way.',
    example: 0,
  })
  exactWindowCount: number;
}
