import { ApiProperty } from '@nestjs/swagger';
import { TEAM_ROLES, TeamRole } from '../../teams/access/team-permissions';

export class AccountDto {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ example: 'olu.owner@quillfeather.example.test' })
  email: string;

  @ApiProperty({ example: 'Olu Okafor (invented)' })
  displayName: string;
}

export class SessionMembershipDto {
  @ApiProperty({ format: 'uuid' })
  teamId: string;

  @ApiProperty({ example: 'Quillfeather Payments (invented demo team)' })
  teamName: string;

  @ApiProperty({ enum: TEAM_ROLES })
  role: TeamRole;
}

export class SessionDto {
  @ApiProperty({ type: AccountDto })
  account: AccountDto;

  @ApiProperty({ type: [SessionMembershipDto], description: 'Teams this account belongs to, with its role in each.' })
  memberships: SessionMembershipDto[];

  @ApiProperty({ format: 'date-time', description: 'When the session ends; sign in again after that.' })
  expiresAt: string;
}

export class CsrfTokenDto {
  @ApiProperty({ description: 'Send this value in the X-Leastline-Csrf header on POST, PUT, PATCH and DELETE.' })
  csrfToken: string;
}
