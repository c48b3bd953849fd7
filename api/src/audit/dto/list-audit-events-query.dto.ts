import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional } from 'class-validator';
import { PageQueryDto } from '../../common/pagination/page-query.dto';
import { AUDIT_ACTIONS, AuditAction } from '../audit-actions';

export class ListAuditEventsQueryDto extends PageQueryDto {
  @ApiPropertyOptional({ enum: AUDIT_ACTIONS, description: 'Only events of this action.' })
  @IsOptional()
  @IsIn(AUDIT_ACTIONS, { message: `action must be one of: ${AUDIT_ACTIONS.join(', ')}` })
  action?: AuditAction;
}
