import { Controller, Get } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { ApiKeyAuth, CurrentApiPrincipal } from './api-key.decorators';
import { ApiPrincipal } from './api-principal';
import { ApiPrincipalDto } from './dto/api-principal.dto';

@ApiTags('api-keys')
@Controller('v1/api-keys/current')
export class CurrentApiKeyController {
  @Get()
  @ApiKeyAuth()
  @ApiOperation({
    summary: 'Describe the calling API key',
    description: 'Checks a key without side effects: its team, scopes and the team plan. Needs no scope.',
  })
  @ApiOkResponse({ type: ApiPrincipalDto })
  describeCurrentApiKey(@CurrentApiPrincipal() principal: ApiPrincipal): ApiPrincipalDto {
    return { teamId: principal.teamId, keyId: principal.keyId, scopes: principal.scopes, teamPlan: principal.teamPlan };
  }
}
