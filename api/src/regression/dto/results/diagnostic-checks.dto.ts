import { ApiProperty } from '@nestjs/swagger';
import { ANALYSIS_ERROR_REASONS, AnalysisErrorReason } from '../../engine/diagnostics/analysis-error';
import { BreuschGodfreyVariant } from '../../engine/diagnostics/breusch-godfrey';
import { BreuschPaganVariant } from '../../engine/diagnostics/breusch-pagan';
import { SerialCorrelationAlternative } from '../../engine/diagnostics/durbin-watson';
import { ReferenceDistribution } from '../../engine/diagnostics/test-outcome';
import { ENGINE_ERROR_CODES } from '../../engine/errors';

/*
 * One class per assumption check, mirroring the engine's result types in engine/diagnostics/. The
 * TypeScript property types are the engine's own (so an engine result is assignable without a cast);
 * where the code guarantees more (RESET always refers to F, Durbin-Watson never has degrees of
 * freedom), the schema says so. Every residual check uses the whitened residuals √w_i e_i and whitened
 * regressors √w_i x_i of a weighted fit.
 */

const WHITENED_NOTE = 'For a weighted fit the whitened residuals √w_i e_i are used.';

/** Fields every hypothesis-test check reports besides its statistic. */
abstract class ComputedTestDto {
  @ApiProperty({ enum: ['computed'], description: 'The check was computed for this model.', example: 'computed' })
  status: 'computed';

  @ApiProperty({
    type: Number,
    description: 'Level at which flagged is judged: the request’s significanceLevel (default 0.05).',
    example: 0.05,
  })
  significanceLevel: number;

  @ApiProperty({
    description: 'True when pValue < significanceLevel: the assumption the check guards is rejected at that level.',
    example: false,
  })
  flagged: boolean;
}

/** Ramsey's RESET test of functional form, F form (engine: ResetResult). */
export class ResetCheckDto extends ComputedTestDto {
  @ApiProperty({
    enum: ['fitted-powers-f-test'],
    description:
      'F form of Ramsey’s (1969) RESET: the model is refitted with powers of its fitted values (on the model’s scale, ' +
      'with the same weights for a weighted fit) added as regressors.',
    example: 'fitted-powers-f-test',
  })
  variant: 'fitted-powers-f-test';

  @ApiProperty({
    type: 'integer',
    isArray: true,
    description:
      'Powers of ŷ kept in the augmented regression: 2 up to resetMaxPower (default 3), less any power exactly collinear with the design.',
    example: [2, 3],
  })
  powers: number[];

  @ApiProperty({
    type: Number,
    description:
      'F = ((RSS_r − RSS_a)/q) / (RSS_a/(n − p − q)): RSS_r of the model, RSS_a of the model with the powers added, q powers kept.',
    example: 1.42,
  })
  statistic: number;

  @ApiProperty({ enum: ['fisher-f'], description: 'Always fisher-f for this check.', example: 'fisher-f' })
  distribution: ReferenceDistribution;

  @ApiProperty({ type: 'integer', description: 'q, the number of powers kept (numerator degrees of freedom).', example: 2 })
  degreesOfFreedom: number | null;

  @ApiProperty({ type: 'integer', description: 'n − p − q (denominator degrees of freedom).', example: 196 })
  denominatorDegreesOfFreedom: number | null;

  @ApiProperty({ type: Number, description: 'Upper-tail probability of statistic under F(q, n − p − q).', example: 0.244 })
  pValue: number;
}

/** Breusch-Pagan test of constant error variance (engine: BreuschPaganResult). */
export class BreuschPaganCheckDto extends ComputedTestDto {
  @ApiProperty({
    enum: ['studentised', 'original'],
    description:
      'studentised (default): Koenker’s (1981) version, robust to non-normal errors. original: Breusch & Pagan (1979), ' +
      'valid under normal errors only.',
    example: 'studentised',
  })
  variant: BreuschPaganVariant;

  @ApiProperty({
    type: [String],
    description:
      'Auxiliary regressors kept, the constant the test adds excluded: the model’s non-constant regressors. For a weighted ' +
      'fit every whitened column √w_i x_i, the intercept’s named "sqrt(weight)". Columns exactly collinear with others are dropped.',
    example: ['ticket_size'],
  })
  regressors: string[];

  @ApiProperty({
    type: Number,
    description:
      'studentised: Koenker’s studentised LM = n·R², R² the centred R² of e_i² regressed on a constant and the regressors. ' +
      'original: LM = ESS/2, ESS the explained sum of squares of g_i = e_i² / (Σ e_j²/n) on the same regressors. ' +
      WHITENED_NOTE,
    example: 3.18,
  })
  statistic: number;

  @ApiProperty({ enum: ['chi-square'], description: 'Always chi-square for this check.', example: 'chi-square' })
  distribution: ReferenceDistribution;

  @ApiProperty({
    type: 'integer',
    description: 'Number of auxiliary regressors kept (p − 1 for an unweighted model with an intercept).',
    example: 1,
  })
  degreesOfFreedom: number | null;

  @ApiProperty({ type: 'integer', nullable: true, description: 'Always null (chi-square reference).', example: null })
  denominatorDegreesOfFreedom: number | null;

  @ApiProperty({ type: Number, description: 'Upper-tail probability of statistic under chi-square(degreesOfFreedom).', example: 0.0745 })
  pValue: number;
}

/** White's test of constant error variance, full version (engine: WhiteResult). */
export class WhiteCheckDto extends ComputedTestDto {
  @ApiProperty({
    enum: ['squares-and-cross-products'],
    description: 'Full White (1980) test: the auxiliary regression uses the regressors, their squares and all pairwise cross-products.',
    example: 'squares-and-cross-products',
  })
  variant: 'squares-and-cross-products';

  @ApiProperty({
    type: [String],
    description:
      'Auxiliary regressors kept, the constant excluded: the non-constant regressors, then squares ("x^2") and cross-products ' +
      '("x*z"). Repeated or exactly collinear columns (a dummy’s square, for example) are dropped.',
    example: ['ticket_size', 'ticket_size^2'],
  })
  regressors: string[];

  @ApiProperty({
    type: Number,
    description: 'LM = n·R², R² the centred R² of e_i² regressed on a constant and the regressors listed. ' + WHITENED_NOTE,
    example: 4.07,
  })
  statistic: number;

  @ApiProperty({ enum: ['chi-square'], description: 'Always chi-square for this check.', example: 'chi-square' })
  distribution: ReferenceDistribution;

  @ApiProperty({ type: 'integer', description: 'Number of auxiliary regressors kept, the constant excluded.', example: 2 })
  degreesOfFreedom: number | null;

  @ApiProperty({ type: 'integer', nullable: true, description: 'Always null (chi-square reference).', example: null })
  denominatorDegreesOfFreedom: number | null;

  @ApiProperty({ type: Number, description: 'Upper-tail probability of statistic under chi-square(degreesOfFreedom).', example: 0.131 })
  pValue: number;
}

/** Durbin-Watson test of first-order serial correlation (engine: DurbinWatsonResult). */
export class DurbinWatsonCheckDto extends ComputedTestDto {
  @ApiProperty({
    enum: ['beta-approximation-exact-moments'],
    description:
      'p-value from the beta approximation of Durbin & Watson (1951), fitted to the exact null mean and variance of d ' +
      'given the design (Durbin & Watson 1950); not the bounds test, so never inconclusive.',
    example: 'beta-approximation-exact-moments',
  })
  variant: 'beta-approximation-exact-moments';

  @ApiProperty({
    enum: ['positive', 'negative', 'two-sided'],
    description:
      'Alternative tested: positive (default) uses P(d ≤ d_obs); negative uses P(d ≥ d_obs); two-sided twice the smaller ' +
      'tail, capped at 1.',
    example: 'positive',
  })
  alternative: SerialCorrelationAlternative;

  @ApiProperty({
    type: Number,
    description:
      'Exact mean of d with no serial correlation, given the design: P/ν, P = tr(MA), M = I − X(X′X)⁻¹X′, A = D′D ' +
      '(first differences), ν = n − p.',
    example: 2.0098,
  })
  nullMean: number;

  @ApiProperty({
    type: Number,
    description: 'Exact variance of d with no serial correlation, given the design: 2(Q − P²/ν)/(ν(ν + 2)), Q = tr((MA)²).',
    example: 0.0197,
  })
  nullVariance: number;

  @ApiProperty({
    type: Number,
    description:
      'd = Σ_{t=2..n} (e_t − e_{t−1})² / Σ_{t=1..n} e_t², rows taken in time order; between 0 and 4, near 2 without serial ' +
      'correlation. ' +
      WHITENED_NOTE,
    example: 1.87,
  })
  statistic: number;

  @ApiProperty({ enum: ['beta-approximation'], description: 'Always beta-approximation: d/4 is referred to a beta distribution.', example: 'beta-approximation' })
  distribution: ReferenceDistribution;

  @ApiProperty({ type: 'integer', nullable: true, description: 'Always null: the beta approximation has no degrees of freedom.', example: null })
  degreesOfFreedom: number | null;

  @ApiProperty({ type: 'integer', nullable: true, description: 'Always null.', example: null })
  denominatorDegreesOfFreedom: number | null;

  @ApiProperty({
    type: Number,
    description:
      'Tail probability of d (per alternative) with d/4 ~ Beta(a, b), a and b chosen so that d has mean nullMean and ' +
      'variance nullVariance.',
    example: 0.176,
  })
  pValue: number;
}

/** Breusch-Godfrey test of serial correlation up to a lag (engine: BreuschGodfreyResult). */
export class BreuschGodfreyCheckDto extends ComputedTestDto {
  @ApiProperty({
    enum: ['lm', 'f'],
    description: 'lm (default): the n·R² form, chi-square reference. f: the F form.',
    example: 'lm',
  })
  variant: BreuschGodfreyVariant;

  @ApiProperty({ type: 'integer', description: 'Highest residual lag L asked for (default 1).', example: 1 })
  lag: number;

  @ApiProperty({
    type: Number,
    description:
      'From regressing e_t on the model’s regressors and e_{t−1}, …, e_{t−L}, lagged residuals before the first row set to ' +
      '0 so all n rows are used (RSS_aux its residual sum of squares, L′ the lags kept). lm: n·(1 − RSS_aux/Σ e_t²), ' +
      'which is n·R² for a model with an intercept. f: ((Σ e_t² − RSS_aux)/L′) / (RSS_aux/(n − p − L′)). ' +
      WHITENED_NOTE,
    example: 0.61,
  })
  statistic: number;

  @ApiProperty({
    enum: ['chi-square', 'fisher-f'],
    description: 'chi-square for variant lm, fisher-f for variant f.',
    example: 'chi-square',
  })
  distribution: ReferenceDistribution;

  @ApiProperty({
    type: 'integer',
    description: 'L′, the lagged residuals kept (equal to lag unless one is exactly collinear with the regressors).',
    example: 1,
  })
  degreesOfFreedom: number | null;

  @ApiProperty({
    type: 'integer',
    nullable: true,
    description: 'Variant f: n − p − L′. Null for variant lm.',
    example: null,
  })
  denominatorDegreesOfFreedom: number | null;

  @ApiProperty({
    type: Number,
    description: 'Upper-tail probability of statistic under chi-square(L′) (lm) or F(L′, n − p − L′) (f).',
    example: 0.435,
  })
  pValue: number;
}

/** Jarque-Bera test of normal errors (engine: JarqueBeraResult). */
export class JarqueBeraCheckDto extends ComputedTestDto {
  @ApiProperty({
    enum: ['moment-skewness-kurtosis'],
    description:
      'Moment-based (population, 1/n) skewness and raw kurtosis of the residuals, about their mean (0 with an intercept).',
    example: 'moment-skewness-kurtosis',
  })
  variant: 'moment-skewness-kurtosis';

  @ApiProperty({
    type: Number,
    description: 'S = m₃/m₂^{3/2} with m_k = (1/n)·Σ (e_i − ē)^k. ' + WHITENED_NOTE,
    example: 0.21,
  })
  skewness: number;

  @ApiProperty({ type: Number, description: 'K = m₄/m₂², raw kurtosis (3 for normal errors), not the excess.', example: 3.34 })
  kurtosis: number;

  @ApiProperty({ type: Number, description: 'JB = n/6·(S² + (K − 3)²/4).', example: 2.43 })
  statistic: number;

  @ApiProperty({ enum: ['chi-square'], description: 'Always chi-square for this check (asymptotic).', example: 'chi-square' })
  distribution: ReferenceDistribution;

  @ApiProperty({ type: 'integer', description: 'Always 2.', example: 2 })
  degreesOfFreedom: number | null;

  @ApiProperty({ type: 'integer', nullable: true, description: 'Always null (chi-square reference).', example: null })
  denominatorDegreesOfFreedom: number | null;

  @ApiProperty({ type: Number, description: 'Upper-tail probability of statistic under chi-square(2).', example: 0.297 })
  pValue: number;
}

/** Variance inflation of one predictor (engine: VarianceInflation). */
export class VarianceInflationDto {
  @ApiProperty({ description: 'Predictor column name.', example: 'ticket_size' })
  term: string;

  @ApiProperty({
    type: Number,
    description:
      'R²_j: centred R² of this predictor regressed on the other non-intercept predictors plus a constant (the constant is ' +
      'used even for a model without an intercept; a weighted fit uses its weights). 0 when there is one predictor.',
    example: 0.41,
  })
  rSquared: number;

  @ApiProperty({ type: Number, description: '1/(1 − R²_j) (Marquardt 1970); 1 when there is one predictor.', example: 1.69 })
  varianceInflationFactor: number;
}

/** Collinearity measures of the design, with a rule-of-thumb flag (engine: CollinearityCheck). */
export class CollinearityCheckDto {
  @ApiProperty({ enum: ['computed'], description: 'The check was computed for this model.', example: 'computed' })
  status: 'computed';

  @ApiProperty({ type: [VarianceInflationDto], description: 'One entry per predictor, the intercept excluded, in predictor order.' })
  varianceInflation: VarianceInflationDto[];

  @ApiProperty({
    type: Number,
    description:
      'σ_max/σ_min of the design with every column, the intercept column included, scaled to unit Euclidean length and not ' +
      'centred (whitened columns √w_i x_i for a weighted fit), after Belsley, Kuh & Welsch (1980). Dimensionless.',
    example: 4.9,
  })
  conditionNumber: number;

  @ApiProperty({
    type: [Number],
    description: 'σ_max/σ_k for every singular value of the same scaled design, in decreasing order of σ_k (the first is 1, the last conditionNumber).',
    example: [1, 4.9],
  })
  conditionIndices: number[];

  @ApiProperty({ description: 'True when the model has an intercept, whose column of ones then takes part in the condition number.', example: true })
  interceptIncluded: boolean;

  @ApiProperty({ type: Boolean, enum: [true], description: 'Always true: the columns are scaled to unit length before the singular values are taken.', example: true })
  columnsScaledToUnitLength: true;

  @ApiProperty({
    description: 'True when any varianceInflationFactor ≥ 10 or conditionNumber ≥ 30 (common-practice thresholds; no p-value is involved).',
    example: false,
  })
  flagged: boolean;
}

/** A requested check that is not defined for this model; the other checks are still reported. */
export class DiagnosticNotDefinedDto {
  @ApiProperty({ enum: ['not-defined'], description: 'The check could not be computed for this model.', example: 'not-defined' })
  status: 'not-defined';

  @ApiProperty({
    enum: ENGINE_ERROR_CODES,
    description:
      'Engine error code that stopped the check: invalid-argument (see reason) for the check’s own limits, or a solver code ' +
      'such as collinear-columns (an exactly singular design has no finite condition number) or too-few-observations (more ' +
      'auxiliary columns than rows).',
    example: 'invalid-argument',
  })
  code: string;

  @ApiProperty({
    enum: ANALYSIS_ERROR_REASONS,
    nullable: true,
    description:
      'The exact reason when code is invalid-argument: usually perfect-fit (the residuals are rounding noise, ‖e‖ ≤ 1e-12·‖y‖ ' +
      'in weighted norms) or test-not-defined (the check’s definition cannot be met for this model). Null for other codes.',
    example: 'perfect-fit',
  })
  reason: AnalysisErrorReason | null;

  @ApiProperty({
    description: 'Human-readable explanation.',
    example: 'The model fits every observation exactly (to within rounding), so the White test is not defined.',
  })
  message: string;
}
