import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsIn, IsOptional, IsString, IsUUID, Matches, MaxLength, MinLength } from 'class-validator';
import { TEAM_ROLES, TeamRole } from '../access/team-permissions';
import { TEAM_PLANS, TeamPlan } from '../team-plans';

export class TeamDto {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ example: 'quillfeather-demo' })
  slug: string;

  @ApiProperty({ example: 'Quillfeather Payments (invented demo team)' })
  name: string;

  @ApiProperty({ enum: TEAM_PLANS })
  plan: string;

  @ApiProperty({ description: 'True for the invented demo team that the seed creates.' })
  isDemo: boolean;

  @ApiProperty({ description: 'Whether developers may create and rotate their own API keys.' })
  developerKeysAllowed: boolean;

  @ApiProperty({ enum: TEAM_ROLES, description: "The caller's role in this team." })
  yourRole: TeamRole;
}

export class TeamListDto {
  @ApiProperty({ type: [TeamDto] })
  items: TeamDto[];
}

const SLUG = /^[a-z0-9](?:[a-z0-9-]{1,62}[a-z0-9])$/;

export class CreateTeamDto {
  @ApiProperty({ example: 'Quillfeather risk analytics (invented)', minLength: 1, maxLength: 200 })
  @IsString()
  @MinLength(1)
  @MaxLength(200)
  name: string;

  @ApiPropertyOptional({
    example: 'quillfeather-risk',
    description: 'Lower-case letters, digits and hyphens, 3–64 characters; derived from the name when omitted.',
  })
  @IsOptional()
  @IsString()
  @Matches(SLUG, { message: 'slug must be 3–64 lower-case letters, digits or hyphens, starting and ending with a letter or digit' })
  slug?: string;
}

export class UpdateTeamDto {
  @ApiPropertyOptional({ minLength: 1, maxLength: 200 })
  @IsOptional()
  @IsString()
  @MinLength(1)
  @MaxLength(200)
  name?: string;

  @ApiPropertyOptional({ description: 'Allow developers to create, rotate and revoke their own API keys.' })
  @IsOptional()
  @IsBoolean()
  developerKeysAllowed?: boolean;
}

export class ChangePlanDto {
  @ApiProperty({ enum: TEAM_PLANS })
  @IsIn(TEAM_PLANS, { message: `plan must be one of: ${TEAM_PLANS.join(', ')}` })
  plan: TeamPlan;
}

export class TransferOwnershipDto {
  @ApiProperty({ format: 'uuid', description: 'A current member who becomes the owner; the previous owner becomes admin.' })
  @IsUUID('all', { message: 'newOwnerUserId must be a UUID' })
  newOwnerUserId: string;
}
