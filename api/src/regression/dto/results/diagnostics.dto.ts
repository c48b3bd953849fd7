import { ApiExtraModels, ApiPropertyOptional, getSchemaPath } from '@nestjs/swagger';
import {
  BreuschGodfreyCheckDto,
  BreuschPaganCheckDto,
  CollinearityCheckDto,
  DiagnosticNotDefinedDto,
  DurbinWatsonCheckDto,
  JarqueBeraCheckDto,
  ResetCheckDto,
  WhiteCheckDto,
} from './diagnostic-checks.dto';

/** The check's own result when status is computed, otherwise the not-defined entry. */
function computedOrNotDefined(check: new () => object): { oneOf: { $ref: string }[] } {
  return { oneOf: [{ $ref: getSchemaPath(check) }, { $ref: getSchemaPath(DiagnosticNotDefinedDto) }] };
}

const PRESENCE = 'Present only when this check was requested (all checks run by default).';

/**
 * The assumption checks of one analysis, keyed by check name in camelCase (the request names checks in kebab-case, e.g. breusch-pagan → breuschPagan) (engine:
 * DiagnosticsBlock). Each entry is either the check's result (status computed) or a not-defined entry
 * (status not-defined); `status` tells them apart.
 */
@ApiExtraModels(
  ResetCheckDto,
  BreuschPaganCheckDto,
  WhiteCheckDto,
  DurbinWatsonCheckDto,
  BreuschGodfreyCheckDto,
  JarqueBeraCheckDto,
  CollinearityCheckDto,
  DiagnosticNotDefinedDto,
)
export class DiagnosticsDto {
  @ApiPropertyOptional({
    ...computedOrNotDefined(ResetCheckDto),
    description: `Functional form: Ramsey’s RESET, F form with powers of the fitted values. ${PRESENCE}`,
  })
  reset?: ResetCheckDto | DiagnosticNotDefinedDto;

  @ApiPropertyOptional({
    ...computedOrNotDefined(BreuschPaganCheckDto),
    description: `Constant error variance: Breusch-Pagan, Koenker’s studentised LM = n·R² by default or the original ESS/2. ${PRESENCE}`,
  })
  breuschPagan?: BreuschPaganCheckDto | DiagnosticNotDefinedDto;

  @ApiPropertyOptional({
    ...computedOrNotDefined(WhiteCheckDto),
    description: `Constant error variance: White’s LM = n·R² with squares and cross-products. ${PRESENCE}`,
  })
  white?: WhiteCheckDto | DiagnosticNotDefinedDto;

  @ApiPropertyOptional({
    ...computedOrNotDefined(DurbinWatsonCheckDto),
    description: `First-order serial correlation: Durbin-Watson d with a beta-approximation p-value. ${PRESENCE}`,
  })
  durbinWatson?: DurbinWatsonCheckDto | DiagnosticNotDefinedDto;

  @ApiPropertyOptional({
    ...computedOrNotDefined(BreuschGodfreyCheckDto),
    description: `Serial correlation up to a lag: Breusch-Godfrey, n·R² (zero-filled lags) or F form. ${PRESENCE}`,
  })
  breuschGodfrey?: BreuschGodfreyCheckDto | DiagnosticNotDefinedDto;

  @ApiPropertyOptional({
    ...computedOrNotDefined(JarqueBeraCheckDto),
    description: `Normal errors: Jarque-Bera from moment-based skewness and kurtosis. ${PRESENCE}`,
  })
  jarqueBera?: JarqueBeraCheckDto | DiagnosticNotDefinedDto;

  @ApiPropertyOptional({
    ...computedOrNotDefined(CollinearityCheckDto),
    description: `Collinearity: variance inflation factors and the scaled condition number. ${PRESENCE}`,
  })
  collinearity?: CollinearityCheckDto | DiagnosticNotDefinedDto;
}
