import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { RSquaredDefinition } from '../../engine/anova';
import { FUNCTIONAL_FORMS, FunctionalForm } from '../../engine/functional-forms';
import { CoefficientEstimateDto } from './coefficient-estimate.dto';
import {
  CoefficientEffectDto,
  FitNumericsDto,
  FitTransformationsDto,
  ObservationResultsDto,
  OriginalScaleSummaryDto,
} from './fit-details.dto';
import { AnovaTableDto, InformationCriteriaDto } from './goodness-of-fit.dto';

const R_SQUARED_DEFINITIONS: readonly RSquaredDefinition[] = ['centred', 'uncentred'];

export const FORM_DESCRIPTION =
  'lin-lin: y on x. log-lin: ln y on x. lin-log: y on ln x. log-log: ln y on ln x. Natural logs; every predictor is ' +
  'transformed the same way.';

/**
 * One least-squares fit with classical inference (engine: FitResult in fit-model.ts). Every statistic is
 * on the model's scale (ln y for log-y forms); `originalScale` carries the figures for y itself.
 */
export class FitResultDto {
  @ApiProperty({
    description: 'Version of the engine’s numerical behaviour that produced these numbers, so stored fits can be traced.',
    example: '1.0.0',
  })
  engineVersion: string;

  @ApiProperty({ enum: FUNCTIONAL_FORMS, description: FORM_DESCRIPTION, example: 'lin-lin' })
  form: FunctionalForm;

  @ApiProperty({ type: () => FitTransformationsDto, description: 'The transforms the form applied to the response and the predictors.' })
  transformations: FitTransformationsDto;

  @ApiProperty({ description: 'Response column name.', example: 'chargeback_rate' })
  response: string;

  @ApiProperty({ type: [String], description: 'Predictor column names, in design order.', example: ['ticket_size'] })
  predictors: string[];

  @ApiProperty({
    description: 'True when the model has a constant term; it is reported first, as the coefficient "(intercept)".',
    example: true,
  })
  intercept: boolean;

  @ApiProperty({
    type: String,
    nullable: true,
    description: 'Name of the weight column of a weighted fit (minimising Σ w_i (y_i − x_i′b)²); null for ordinary least squares.',
    example: null,
  })
  weights: string | null;

  @ApiProperty({ type: 'integer', description: 'n: rows used in the fit.', example: 200 })
  observationCount: number;

  @ApiProperty({ type: 'integer', description: 'p: coefficients estimated, the intercept included.', example: 2 })
  coefficientCount: number;

  @ApiProperty({ type: Number, description: 'Level of every confidence interval in this result, strictly between 0 and 1.', example: 0.95 })
  confidenceLevel: number;

  @ApiProperty({
    type: [CoefficientEstimateDto],
    description: 'Coefficient table under the classical covariance s²(X′WX)⁻¹, in design order (intercept first when present).',
  })
  coefficients: CoefficientEstimateDto[];

  @ApiProperty({ type: () => AnovaTableDto, description: 'Analysis-of-variance table and the overall F-test.' })
  anova: AnovaTableDto;

  @ApiProperty({
    type: Number,
    description:
      'Share of variation explained, on the model’s scale. Centred 1 − RSS/Σ w_i (y_i − ȳ_w)² for models with an intercept; ' +
      'uncentred 1 − RSS/Σ w_i y_i² without one, as the NIST StRD suite certifies for its no-intercept datasets (see ' +
      'rSquaredDefinition). Computed as (total − RSS)/total in double-double and kept within [0, 1].',
    example: 0.3364,
  })
  rSquared: number;

  @ApiProperty({
    type: Number,
    description:
      '1 − (RSS/total sum of squares)·(total df)/(n − p), total df being n − 1 with an intercept and n without one. ' +
      'Can be negative.',
    example: 0.333,
  })
  adjustedRSquared: number;

  @ApiProperty({
    enum: R_SQUARED_DEFINITIONS,
    description: 'Which total rSquared is measured against: centred (model with an intercept) or uncentred (model without one).',
    example: 'centred',
  })
  rSquaredDefinition: RSquaredDefinition;

  @ApiProperty({
    type: Number,
    description:
      's = √(RSS/(n − p)), the estimated error standard deviation in units of the response on the model’s scale ' +
      '(ln-y units for log-y forms).',
    example: 0.00144,
  })
  residualStandardError: number;

  @ApiProperty({ type: 'integer', description: 'n − p.', example: 198 })
  residualDegreesOfFreedom: number;

  @ApiProperty({
    type: () => InformationCriteriaDto,
    description: 'Gaussian log-likelihood, AIC and BIC on the model’s scale, with σ counted as a parameter.',
  })
  informationCriteria: InformationCriteriaDto;

  @ApiProperty({
    description:
      'True when RSS is exactly 0. Then every standard error is 0 and tStatistic, pValue, fStatistic, fPValue, the ' +
      'log-likelihood, AIC and BIC are null.',
    example: false,
  })
  perfectFit: boolean;

  @ApiProperty({
    type: [CoefficientEffectDto],
    description: 'One entry per predictor (the intercept excluded), in predictor order: its slope read in the form’s units.',
  })
  effects: CoefficientEffectDto[];

  @ApiProperty({
    type: () => OriginalScaleSummaryDto,
    nullable: true,
    description: 'Log-y forms (log-lin, log-log) only: Duan’s smearing factor and the Jacobian-adjusted criteria of y. Null otherwise.',
  })
  originalScale: OriginalScaleSummaryDto | null;

  @ApiPropertyOptional({
    type: () => ObservationResultsDto,
    description: 'Present only when per-observation results were asked for: one value per row, in row order.',
  })
  observations?: ObservationResultsDto;

  @ApiProperty({ type: () => FitNumericsDto, description: 'Which solver ran and how well conditioned its working problem was.' })
  numerics: FitNumericsDto;
}
