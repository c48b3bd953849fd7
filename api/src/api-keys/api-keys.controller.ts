import { Body, Controller, Delete, Get, HttpCode, Param, Post } from '@nestjs/common';
import {
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiOkResponse,
  ApiOperation,
  ApiParam,
  ApiTags,
} from '@nestjs/swagger';
import { AuditActor } from '../audit/audit.service';
import { CurrentActor, CurrentTeam, TeamPermissionRequired } from '../auth/auth.decorators';
import { TeamAccess } from '../common/request-context/request-principals';
import { ApiTeamIdParam } from '../common/request-context/team-id-param';
import { uuidParam } from '../common/request-context/uuid-param.pipe';
import { ApiKeysService } from './api-keys.service';
import { ApiKeyDto, ApiKeyListDto, CreateApiKeyDto, CreatedApiKeyDto, RotateApiKeyDto } from './dto/api-key.dto';

type Actor = AuditActor & { userId: string; email: string };

@ApiTags('api-keys')
@Controller('v1/teams/:teamId/api-keys')
@ApiTeamIdParam()
export class ApiKeysController {
  constructor(private readonly apiKeys: ApiKeysService) {}

  @Get()
  @TeamPermissionRequired('keys:manage-own')
  @ApiOperation({ summary: 'List API keys', description: 'Owners and admins see every key; developers see their own.' })
  @ApiOkResponse({ type: ApiKeyListDto })
  async listApiKeys(@CurrentTeam() team: TeamAccess, @CurrentActor() actor: Actor): Promise<ApiKeyListDto> {
    return { items: await this.apiKeys.list(team, actor) };
  }

  @Post()
  @TeamPermissionRequired('keys:manage-own')
  @ApiOperation({ summary: 'Create an API key', description: 'The answer holds the full key; it is never shown again.' })
  @ApiCreatedResponse({ type: CreatedApiKeyDto })
  createApiKey(@CurrentTeam() team: TeamAccess, @CurrentActor() actor: Actor, @Body() body: CreateApiKeyDto): Promise<CreatedApiKeyDto> {
    return this.apiKeys.create(team, actor, body);
  }

  @Get(':keyId')
  @TeamPermissionRequired('keys:manage-own')
  @ApiParam({ name: 'keyId', format: 'uuid' })
  @ApiOperation({ summary: 'Get an API key' })
  @ApiOkResponse({ type: ApiKeyDto })
  getApiKey(@CurrentTeam() team: TeamAccess, @CurrentActor() actor: Actor, @Param('keyId', uuidParam('keyId')) keyId: string): Promise<ApiKeyDto> {
    return this.apiKeys.get(team, actor, keyId);
  }

  @Post(':keyId/rotation')
  @TeamPermissionRequired('keys:manage-own')
  @ApiParam({ name: 'keyId', format: 'uuid' })
  @ApiOperation({
    summary: 'Rotate an API key',
    description:
      'Issues a replacement with the same name, scopes and expiry. The old key keeps working for `overlapHours` ' +
      '(default 24), then is refused as rotated out. A notice is e-mailed to the key creator.',
  })
  @ApiCreatedResponse({ type: CreatedApiKeyDto })
  @ApiConflictResponse({ description: 'The key is not active (already rotated, revoked or expired).' })
  rotateApiKey(
    @CurrentTeam() team: TeamAccess,
    @CurrentActor() actor: Actor,
    @Param('keyId', uuidParam('keyId')) keyId: string,
    @Body() body: RotateApiKeyDto,
  ): Promise<CreatedApiKeyDto> {
    return this.apiKeys.rotate(team, actor, keyId, body);
  }

  @Delete(':keyId')
  @HttpCode(204)
  @TeamPermissionRequired('keys:manage-own')
  @ApiParam({ name: 'keyId', format: 'uuid' })
  @ApiOperation({ summary: 'Revoke an API key', description: 'Immediate: the next request with the key is refused.' })
  @ApiNoContentResponse({ description: 'Revoked (or already revoked).' })
  async revokeApiKey(@CurrentTeam() team: TeamAccess, @CurrentActor() actor: Actor, @Param('keyId', uuidParam('keyId')) keyId: string): Promise<void> {
    await this.apiKeys.revoke(team, actor, keyId);
  }
}
