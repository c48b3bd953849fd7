import { ApiProperty } from '@nestjs/swagger';
import { CoefficientInferenceDto } from './coefficient-inference.dto';
import { DiagnosticsDto } from './diagnostics.dto';

/**
 * One fit analysed under a chosen coefficient covariance, without the assumption checks: the engine's
 * AnalysisResult (analyse-model.ts) minus `diagnostics`.
 */
export class InferenceResultDto extends CoefficientInferenceDto {
  @ApiProperty({ type: 'integer', description: 'n: rows used in the fit.', example: 200 })
  observationCount: number;

  @ApiProperty({
    type: 'integer',
    description: 'n − p, whatever the covariance (the cluster covariance’s G − 1 is covariance.inferenceDegreesOfFreedom).',
    example: 198,
  })
  residualDegreesOfFreedom: number;

  @ApiProperty({
    type: Number,
    description: 'Level at which every check’s flagged is judged, strictly between 0 and 1 (default 0.05).',
    example: 0.05,
  })
  significanceLevel: number;
}

/** The engine's AnalysisResult in full: the inference plus the assumption checks. */
export class AnalysisResultDto extends InferenceResultDto {
  @ApiProperty({ type: () => DiagnosticsDto, description: 'The requested assumption checks, keyed by check name.' })
  diagnostics: DiagnosticsDto;
}
