import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { MailModule } from '../mail/mail.module';
import { TeamAccessModule } from '../teams/access/team-access.module';
import { CsrfGuard } from './csrf.guard';
import { CsrfService } from './csrf.service';
import { PasswordReset } from './models/password-reset.model';
import { Session } from './models/session.model';
import { SignInThrottle } from './models/sign-in-throttle.model';
import { User } from './models/user.model';
import { PasswordHasher } from './password-hasher.service';
import { PasswordResetsController } from './password-resets.controller';
import { PasswordResetsService } from './password-resets.service';
import { OptionalSessionGuard, SessionGuard } from './session.guard';
import { SessionController } from './session.controller';
import { SessionViewService } from './session-view.service';
import { SessionsService } from './sessions.service';
import { SignInThrottleService } from './sign-in-throttle.service';
import { UsersService } from './users.service';

/**
 * Console accounts: sign-in, sessions, CSRF, password reset. Exports the guards (and what they need) so
 * other features can protect their console routes with @SignedIn() / @TeamPermissionRequired().
 */
@Module({
  imports: [SequelizeModule.forFeature([User, Session, SignInThrottle, PasswordReset]), MailModule, TeamAccessModule],
  controllers: [SessionController, PasswordResetsController],
  providers: [
    UsersService,
    PasswordHasher,
    SessionsService,
    SessionViewService,
    SignInThrottleService,
    PasswordResetsService,
    CsrfService,
    CsrfGuard,
    SessionGuard,
    OptionalSessionGuard,
  ],
  exports: [
    UsersService,
    PasswordHasher,
    SessionsService,
    SessionViewService,
    CsrfService,
    CsrfGuard,
    SessionGuard,
    OptionalSessionGuard,
    TeamAccessModule,
  ],
})
export class AuthModule {}
