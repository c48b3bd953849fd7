import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { ApiKeysModule } from '../api-keys/api-keys.module';
import { AuthModule } from '../auth/auth.module';
import { MailModule } from '../mail/mail.module';
import { TeamAccessModule } from './access/team-access.module';
import { InvitationAcceptanceController, TeamInvitationsController } from './invitations.controller';
import { InvitationsService } from './invitations.service';
import { MembersController } from './members.controller';
import { MembersService } from './members.service';
import { Invitation } from './models/invitation.model';
import { Membership } from './models/membership.model';
import { Team } from './models/team.model';
import { TeamsController } from './teams.controller';
import { TeamsService } from './teams.service';

@Module({
  imports: [SequelizeModule.forFeature([Team, Membership, Invitation]), AuthModule, TeamAccessModule, MailModule, ApiKeysModule],
  controllers: [TeamsController, MembersController, TeamInvitationsController, InvitationAcceptanceController],
  providers: [TeamsService, MembersService, InvitationsService],
  exports: [TeamsService],
})
export class TeamsModule {}
