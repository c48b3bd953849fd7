import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { RequestLogEntry } from './models/request-log-entry.model';
import { UsageRecord } from './models/usage-record.model';
import { UsageController } from './usage.controller';
import { UsageService } from './usage.service';

@Module({
  imports: [SequelizeModule.forFeature([UsageRecord, RequestLogEntry])],
  controllers: [UsageController],
  providers: [UsageService],
  exports: [UsageService],
})
export class UsageModule {}
