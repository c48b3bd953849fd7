import { ApiProperty } from '@nestjs/swagger';
import { AUDIT_ACTIONS } from '../audit-actions';

export class AuditActorDto {
  @ApiProperty({ type: String, nullable: true, format: 'uuid', description: 'The signed-in person, if any.' })
  userId: string | null;

  @ApiProperty({ type: String, nullable: true, description: "The person's e-mail address at the time.", example: 'ada.admin@quillfeather.example.test' })
  email: string | null;

  @ApiProperty({ type: String, nullable: true, format: 'uuid', description: 'The API key, for actions made through the public API.' })
  apiKeyId: string | null;
}

export class AuditTargetDto {
  @ApiProperty({ example: 'api-key', description: 'Kind of thing acted on.' })
  type: string;

  @ApiProperty({ example: '0b5e2a4e-5f0e-4a9b-9a57-0d1f1c7e2a10' })
  id: string;
}

export class AuditEventDto {
  @ApiProperty({ description: 'Increasing identifier (a decimal string).', example: '1042' })
  id: string;

  @ApiProperty({ enum: AUDIT_ACTIONS })
  action: string;

  @ApiProperty({ format: 'date-time' })
  occurredAt: string;

  @ApiProperty({ type: AuditActorDto })
  actor: AuditActorDto;

  @ApiProperty({ type: String, nullable: true, description: 'Network address the request came from.', example: '203.0.113.7' })
  ipAddress: string | null;

  @ApiProperty({ type: AuditTargetDto, nullable: true })
  target: AuditTargetDto | null;

  @ApiProperty({ type: 'object', additionalProperties: true, description: 'Action-specific facts, e.g. old and new role.' })
  details: Record<string, unknown>;
}

export class AuditEventPageDto {
  @ApiProperty({ type: [AuditEventDto] })
  items: AuditEventDto[];

  @ApiProperty({ type: String, nullable: true, description: 'Pass as `cursor` for the next page; null on the last page.' })
  nextCursor: string | null;
}
