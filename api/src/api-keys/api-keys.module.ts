import { Module } from '@nestjs/common';
import { PassportModule } from '@nestjs/passport';
import { SequelizeModule } from '@nestjs/sequelize';
import { AuthModule } from '../auth/auth.module';
import { MailModule } from '../mail/mail.module';
import { ApiKeyAuthenticator } from './api-key-authenticator.service';
import { ApiKeyUsageRecorder } from './api-key-usage-recorder.service';
import { ApiKeyGuard } from './api-key.guard';
import { BearerKeyStrategy, HeaderKeyStrategy } from './api-key.strategies';
import { ApiKeysController } from './api-keys.controller';
import { ApiKeysService } from './api-keys.service';
import { CurrentApiKeyController } from './current-api-key.controller';
import { KeyCacheInvalidation } from './key-cache-invalidation.service';
import { ApiKey } from './models/api-key.model';

/**
 * API keys: console management routes, and the guard for the public API. Feature modules that serve the
 * public API import this module and decorate their routes with @ApiKeyAuth(...scopes) (or
 * @UseGuards(ApiKeyGuard) + @RequireScopes(...)) and read the caller with @CurrentApiPrincipal().
 */
@Module({
  imports: [SequelizeModule.forFeature([ApiKey]), PassportModule, AuthModule, MailModule],
  controllers: [ApiKeysController, CurrentApiKeyController],
  providers: [ApiKeysService, ApiKeyAuthenticator, KeyCacheInvalidation, ApiKeyUsageRecorder, BearerKeyStrategy, HeaderKeyStrategy, ApiKeyGuard],
  exports: [ApiKeyAuthenticator, ApiKeyUsageRecorder, ApiKeyGuard],
})
export class ApiKeysModule {}
