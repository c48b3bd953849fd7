import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { Membership } from '../models/membership.model';
import { Team } from '../models/team.model';
import { TeamAccessService } from './team-access.service';
import { TeamPermissionGuard } from './team-permission.guard';

@Module({
  imports: [SequelizeModule.forFeature([Team, Membership])],
  providers: [TeamAccessService, TeamPermissionGuard],
  exports: [TeamAccessService, TeamPermissionGuard],
})
export class TeamAccessModule {}
