import { ApiProperty } from '@nestjs/swagger';
import { API_KEY_SCOPES, ApiKeyScope } from '../api-key-scopes';

export class ApiPrincipalDto {
  @ApiProperty({ format: 'uuid' })
  teamId: string;

  @ApiProperty({ format: 'uuid', description: "The key's id as listed in the console." })
  keyId: string;

  @ApiProperty({ enum: API_KEY_SCOPES, isArray: true })
  scopes: ApiKeyScope[];

  @ApiProperty({ example: 'growth' })
  teamPlan: string;
}
