import { ApiProperty } from '@nestjs/swagger';
import { IsIn } from 'class-validator';
import { ASSIGNABLE_ROLES, AssignableRole, TEAM_ROLES, TeamRole } from '../access/team-permissions';

export class MemberDto {
  @ApiProperty({ format: 'uuid' })
  userId: string;

  @ApiProperty({ example: 'dev.dana@quillfeather.example.test' })
  email: string;

  @ApiProperty({ example: 'Dana Devlin (invented)' })
  displayName: string;

  @ApiProperty({ enum: TEAM_ROLES })
  role: TeamRole;

  @ApiProperty({ format: 'date-time' })
  joinedAt: string;
}

export class MemberListDto {
  @ApiProperty({ type: [MemberDto] })
  items: MemberDto[];
}

export class ChangeRoleDto {
  @ApiProperty({ enum: ASSIGNABLE_ROLES, description: 'Ownership moves only through ownership transfer.' })
  @IsIn(ASSIGNABLE_ROLES, { message: `role must be one of: ${ASSIGNABLE_ROLES.join(', ')} (use ownership transfer for owner)` })
  role: AssignableRole;
}
