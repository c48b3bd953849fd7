import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsEmail, IsIn, IsOptional, IsString, Matches, MaxLength, MinLength } from 'class-validator';
import { AccountDto } from '../../auth/dto/session.dto';
import { IsAcceptablePassword } from '../../auth/dto/password.validator';
import { ASSIGNABLE_ROLES, AssignableRole, TEAM_ROLES, TeamRole } from '../access/team-permissions';

export class CreateInvitationDto {
  @ApiProperty({ example: 'new.analyst@quillfeather.example.test', maxLength: 320 })
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(320)
  email: string;

  @ApiProperty({ enum: ASSIGNABLE_ROLES })
  @IsIn(ASSIGNABLE_ROLES, { message: `role must be one of: ${ASSIGNABLE_ROLES.join(', ')}` })
  role: AssignableRole;
}

export class InvitationDto {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ example: 'new.analyst@quillfeather.example.test' })
  email: string;

  @ApiProperty({ enum: TEAM_ROLES })
  role: TeamRole;

  @ApiProperty({ enum: ['pending', 'expired'] })
  status: 'pending' | 'expired';

  @ApiProperty({ type: String, nullable: true, format: 'uuid' })
  invitedByUserId: string | null;

  @ApiProperty({ format: 'date-time' })
  createdAt: string;

  @ApiProperty({ format: 'date-time' })
  expiresAt: string;
}

export class InvitationListDto {
  @ApiProperty({ type: [InvitationDto], description: 'Invitations neither accepted nor withdrawn.' })
  items: InvitationDto[];
}

const TOKEN = /^[A-Za-z0-9_-]{43}$/;

export class InvitationTokenDto {
  @ApiProperty({ description: 'The token from the e-mailed link (the part after "token=").' })
  @IsString()
  @Matches(TOKEN, { message: 'token must be the 43-character value from the e-mailed link' })
  token: string;
}

export class InvitationPreviewDto {
  @ApiProperty({ example: 'Quillfeather Payments (invented demo team)' })
  teamName: string;

  @ApiProperty({ enum: TEAM_ROLES })
  role: TeamRole;

  @ApiProperty({ example: 'new.analyst@quillfeather.example.test' })
  email: string;

  @ApiProperty({ format: 'date-time' })
  expiresAt: string;

  @ApiProperty({ description: 'True when the invited address already has an account: sign in as it, then accept.' })
  accountExists: boolean;
}

export class AcceptInvitationDto extends InvitationTokenDto {
  @ApiPropertyOptional({ description: 'Needed only when the invited address has no account yet.', maxLength: 120 })
  @IsOptional()
  @IsString()
  @MinLength(1)
  @MaxLength(120)
  displayName?: string;

  @ApiPropertyOptional({ description: 'Needed only when the invited address has no account yet; at least 12 characters.' })
  @IsOptional()
  @IsAcceptablePassword()
  password?: string;
}

export class InvitationAcceptanceDto {
  @ApiProperty({ format: 'uuid' })
  teamId: string;

  @ApiProperty({ example: 'Quillfeather Payments (invented demo team)' })
  teamName: string;

  @ApiProperty({ enum: TEAM_ROLES })
  role: TeamRole;

  @ApiProperty({ type: AccountDto })
  account: AccountDto;

  @ApiProperty({ description: 'True when accepting created the account (and signed it in with a new session cookie).' })
  accountCreated: boolean;
}
