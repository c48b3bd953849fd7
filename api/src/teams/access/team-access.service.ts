import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Transaction } from 'sequelize';
import { Membership } from '../models/membership.model';
import { Team } from '../models/team.model';
import { TeamRole } from './team-permissions';

export interface MembershipSummary {
  teamId: string;
  teamSlug: string;
  teamName: string;
  teamPlan: string;
  isDemo: boolean;
  developerKeysAllowed: boolean;
  role: TeamRole;
}

/**
 * Read-only questions about teams and memberships that other features (sessions, API keys, the permission
 * guard) need. Kept in its own small module so those features can depend on it without depending on the
 * team-management routes, which in turn depend on them.
 */
@Injectable()
export class TeamAccessService {
  constructor(
    @InjectModel(Team) private readonly teams: typeof Team,
    @InjectModel(Membership) private readonly memberships: typeof Membership,
  ) {}

  async findMembership(teamId: string, userId: string, transaction?: Transaction): Promise<MembershipSummary | undefined> {
    const membership = await this.memberships.findOne({ where: { teamId, userId }, include: [Team], transaction });
    return membership?.team ? summarise(membership, membership.team) : undefined;
  }

  async listMemberships(userId: string): Promise<MembershipSummary[]> {
    const rows = await this.memberships.findAll({ where: { userId }, include: [Team], order: [[{ model: Team, as: 'team' }, 'name', 'ASC']] });
    return rows.flatMap((row) => (row.team ? [summarise(row, row.team)] : []));
  }

  async findTeam(teamId: string): Promise<Team | null> {
    return this.teams.findByPk(teamId);
  }

  /** User ids holding one of the roles, for notices that go to a team's owner and admins. */
  async userIdsWithRoles(teamId: string, roles: TeamRole[]): Promise<string[]> {
    const rows = await this.memberships.findAll({ where: { teamId, role: roles }, attributes: ['userId'] });
    return rows.map((row) => row.userId);
  }
}

function summarise(membership: Membership, team: Team): MembershipSummary {
  return {
    teamId: team.id,
    teamSlug: team.slug,
    teamName: team.name,
    teamPlan: team.plan,
    isDemo: team.isDemo,
    developerKeysAllowed: team.developerKeysAllowed,
    role: membership.role,
  };
}
