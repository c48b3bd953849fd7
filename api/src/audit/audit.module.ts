import { Global, Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { AuditService } from './audit.service';
import { AuditEvent } from './models/audit-event.model';

/**
 * The audit log's writer, global because nearly every feature records events, including the sign-in
 * flow that the audit routes themselves depend on (a plain import would be circular).
 */
@Global()
@Module({
  imports: [SequelizeModule.forFeature([AuditEvent])],
  providers: [AuditService],
  exports: [AuditService],
})
export class AuditModule {}
