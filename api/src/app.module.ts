import { Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { CONFIG_NAMESPACES } from './config/configuration';
import { validateEnvironment } from './config/env.validation';
import { DatabaseModule } from './database/database.module';
import { HealthModule } from './health/health.module';
import { ApiKeysModule } from './api-keys/api-keys.module';
import { AuditEventsModule } from './audit/audit-events.module';
import { AuditModule } from './audit/audit.module';
import { AuthModule } from './auth/auth.module';
import { MailModule } from './mail/mail.module';
import { TeamsModule } from './teams/teams.module';
import { PublicApiModule } from './common/public-api/public-api.module';
import { DatasetsModule } from './datasets/datasets.module';
import { RegressionModule } from './regression/regression.module';
import { UsageModule } from './usage/usage.module';

@Module({
  imports: [
    ConfigModule.forRoot({
      isGlobal: true,
      ignoreEnvFile: true,
      load: CONFIG_NAMESPACES,
      validate: validateEnvironment,
    }),
    DatabaseModule,
    HealthModule,
    AuditModule,
    MailModule,
    AuthModule,
    TeamsModule,
    ApiKeysModule,
    AuditEventsModule,
    PublicApiModule,
    UsageModule,
    DatasetsModule,
    RegressionModule,
  ],
})
export class AppModule {}
