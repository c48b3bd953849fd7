import { Module } from '@nestjs/common';
import { AuthModule } from '../auth/auth.module';
import { AuditEventsController } from './audit-events.controller';

/** The audit log's read route, separate from AuditModule so that one can stay free of the auth imports. */
@Module({
  imports: [AuthModule],
  controllers: [AuditEventsController],
})
export class AuditEventsModule {}
