import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsBoolean, IsNumber, IsOptional, ValidateBy, ValidateNested } from 'class-validator';
import { IsStrictlyBetween } from '../../common/validation/is-strictly-between';
import { CommonFitOptionsDto, CovarianceChoiceDto, DIAGNOSTIC_CHOICES, DiagnosticOptionsDto, ModelSpecDto } from './model-request.dto';

export class CreateFitDto extends CommonFitOptionsDto {
  @ApiProperty({ type: ModelSpecDto })
  @ValidateNested()
  @Type(() => ModelSpecDto)
  model: ModelSpecDto;

  @ApiPropertyOptional({ type: CovarianceChoiceDto, description: 'Covariance behind the inference block (default classical).' })
  @IsOptional()
  @ValidateNested()
  @Type(() => CovarianceChoiceDto)
  covariance?: CovarianceChoiceDto;

  @ApiPropertyOptional({
    description: 'Assumption checks to run: "all" (default), "none", or a list.',
    oneOf: [{ type: 'string', enum: ['all', 'none'] }, { type: 'array', items: { type: 'string', enum: [...DIAGNOSTIC_CHOICES] } }],
  })
  @IsOptional()
  @ValidateBy({
    name: 'isDiagnosticSelection',
    validator: {
      validate: (value: unknown) =>
        value === 'all' ||
        value === 'none' ||
        (Array.isArray(value) && value.every((name) => (DIAGNOSTIC_CHOICES as readonly unknown[]).includes(name))),
      defaultMessage: () => `diagnostics must be "all", "none" or a list drawn from ${DIAGNOSTIC_CHOICES.join(', ')}`,
    },
  })
  diagnostics?: 'all' | 'none' | (typeof DIAGNOSTIC_CHOICES)[number][];

  @ApiPropertyOptional({ default: 0.05, description: 'Level at which each check is flagged (p-value below it), strictly between 0 and 1.' })
  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @IsStrictlyBetween(0, 1)
  significanceLevel?: number;

  @ApiPropertyOptional({ type: DiagnosticOptionsDto })
  @IsOptional()
  @ValidateNested()
  @Type(() => DiagnosticOptionsDto)
  diagnosticOptions?: DiagnosticOptionsDto;

  @ApiPropertyOptional({
    default: false,
    description:
      'Also return per-row fitted values, residuals, standardised and studentised residuals, leverage and Cook’s distance (fits of up to 1,000,000 rows).',
  })
  @IsOptional()
  @IsBoolean()
  includeObservations?: boolean;
}
