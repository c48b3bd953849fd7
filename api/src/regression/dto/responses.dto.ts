import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { InferenceResultDto } from './results/analysis-result.dto';
import { BatchFitResultDto } from './results/batch-fit-result.dto';
import { CovarianceDescriptionDto } from './results/coefficient-inference.dto';
import { DiagnosticsDto } from './results/diagnostics.dto';
import { FitResultDto } from './results/fit-result.dto';
import { FormComparisonResultDto } from './results/form-comparison-result.dto';
import { PredictionResultDto } from './results/prediction-result.dto';
import { RollingFitResultDto } from './results/rolling-fit-result.dto';

export class DataSourceDescriptionDto {
  @ApiProperty({ enum: ['inline', 'dataset', 'stored-fit'] })
  kind: 'inline' | 'dataset' | 'stored-fit';

  @ApiPropertyOptional({ format: 'uuid' })
  datasetId?: string;

  @ApiPropertyOptional()
  datasetName?: string;

  @ApiPropertyOptional()
  datasetVersion?: number;

  @ApiPropertyOptional({ description: 'The dataset version’s content hash (SHA-256).' })
  datasetContentHash?: string;

  @ApiPropertyOptional({ format: 'uuid', description: 'Predictions from a stored fit: its id.' })
  fitId?: string;

  @ApiPropertyOptional({ description: 'Predictions from a stored fit: its input hash.' })
  fitInputHash?: string;
}

export class RowAccountingDto {
  @ApiProperty({ description: 'Rows in the data sent or stored.' })
  total: number;

  @ApiProperty({ description: 'Rows the model used.' })
  used: number;

  @ApiProperty({ description: 'Rows left out for missing values (missingValues = drop-rows).' })
  droppedCount: number;

  @ApiProperty({ type: [Number], description: 'The first 100 dropped rows, 0-based.' })
  dropped: number[];
}

export class UsageChargeDto {
  @ApiProperty({ description: 'Units charged for this call: models + ceil(observations / 10 000), at least 1.' })
  units: number;

  @ApiProperty({ description: 'Observations counted.' })
  observations: number;
}

/** What every billable answer starts with: identity, reproducibility and the charge. */
export class ResultEnvelopeDto {
  @ApiProperty({ format: 'uuid', description: 'Id of the stored result (GET /v1/results/{resultId}).' })
  id: string;

  @ApiProperty({ enum: ['fit', 'form-comparison', 'prediction', 'batch-fit', 'rolling-fit'] })
  kind: string;

  @ApiProperty({ format: 'date-time' })
  createdAt: string;

  @ApiProperty({ description: 'Version of the regression engine that computed the result.', example: '1.0.0' })
  engineVersion: string;

  @ApiProperty({
    description:
      'SHA-256 over the canonical specification and the exact values the engine received, column by column: equal hashes mean the same model on the same numbers.',
  })
  inputHash: string;

  @ApiProperty({ description: 'The request id of the call that computed it.' })
  requestId: string;

  @ApiProperty({ type: 'object', additionalProperties: true, description: 'The request without its data columns.' })
  specification: Record<string, unknown>;

  @ApiProperty({
    description: 'A plain caution: estimates under the stated assumptions, not financial advice.',
  })
  caution: string;
}

class BillableEnvelopeDto extends ResultEnvelopeDto {
  @ApiProperty({ type: UsageChargeDto })
  usage: UsageChargeDto;

  @ApiProperty({ type: DataSourceDescriptionDto })
  source: DataSourceDescriptionDto;
}

export class FitResponseDto extends BillableEnvelopeDto {
  @ApiProperty({ type: RowAccountingDto })
  rows: RowAccountingDto;

  @ApiProperty({ type: FitResultDto, description: 'The fit with classical inference, ANOVA and goodness of fit.' })
  fit: FitResultDto;

  @ApiProperty({ type: InferenceResultDto, description: 'Coefficients and the Wald test under the requested covariance.' })
  inference: InferenceResultDto;

  @ApiProperty({ type: DiagnosticsDto, description: 'The requested assumption checks (empty with diagnostics = "none").' })
  diagnostics: DiagnosticsDto;
}

export class FormComparisonResponseDto extends BillableEnvelopeDto {
  @ApiProperty({ type: RowAccountingDto })
  rows: RowAccountingDto;

  @ApiProperty({ type: FormComparisonResultDto })
  comparison: FormComparisonResultDto;
}

export class PredictionResponseDto extends BillableEnvelopeDto {
  @ApiPropertyOptional({ type: RowAccountingDto, description: 'Absent for predictions from a stored fit.' })
  rows?: RowAccountingDto;

  @ApiProperty({ type: CovarianceDescriptionDto, description: 'The covariance behind the intervals.' })
  covariance: CovarianceDescriptionDto;

  @ApiProperty({ type: PredictionResultDto })
  prediction: PredictionResultDto;
}

export class BatchFitResponseDto extends BillableEnvelopeDto {
  @ApiProperty({ type: RowAccountingDto })
  rows: RowAccountingDto;

  @ApiProperty({ type: BatchFitResultDto })
  batch: BatchFitResultDto;
}

export class RollingFitResponseDto extends BillableEnvelopeDto {
  @ApiProperty({ type: RowAccountingDto })
  rows: RowAccountingDto;

  @ApiProperty({ type: RollingFitResultDto })
  rolling: RollingFitResultDto;
}

/** A stored result as fetched again: the envelope plus whichever result block its kind has. */
export class StoredResultResponseDto extends ResultEnvelopeDto {
  @ApiPropertyOptional({ type: DataSourceDescriptionDto })
  source?: DataSourceDescriptionDto;

  @ApiPropertyOptional({ type: RowAccountingDto })
  rows?: RowAccountingDto;

  @ApiPropertyOptional({ type: FitResultDto })
  fit?: FitResultDto;

  @ApiPropertyOptional({ type: InferenceResultDto })
  inference?: InferenceResultDto;

  @ApiPropertyOptional({ type: DiagnosticsDto })
  diagnostics?: DiagnosticsDto;

  @ApiPropertyOptional({ type: FormComparisonResultDto })
  comparison?: FormComparisonResultDto;

  @ApiPropertyOptional({ type: PredictionResultDto })
  prediction?: PredictionResultDto;

  @ApiPropertyOptional({ type: BatchFitResultDto })
  batch?: BatchFitResultDto;

  @ApiPropertyOptional({ type: RollingFitResultDto })
  rolling?: RollingFitResultDto;
}
