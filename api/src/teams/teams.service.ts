import { Injectable } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { randomBytes } from 'node:crypto';
import { UniqueConstraintError } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { ApiKeyAuthenticator } from '../api-keys/api-key-authenticator.service';
import { AuditActor, AuditService } from '../audit/audit.service';
import { ProblemException } from '../common/problem-details/problem.exception';
import { PROBLEM_TYPES } from '../common/problem-details/problem-types';
import { TeamAccess } from '../common/request-context/request-principals';
import { TeamAccessService } from './access/team-access.service';
import { CreateTeamDto, TeamDto, UpdateTeamDto } from './dto/team.dto';
import { Membership } from './models/membership.model';
import { Team } from './models/team.model';
import { TeamPlan } from './team-plans';

type Actor = AuditActor & { userId: string; email: string };

@Injectable()
export class TeamsService {
  constructor(
    @InjectModel(Team) private readonly teams: typeof Team,
    @InjectModel(Membership) private readonly memberships: typeof Membership,
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly access: TeamAccessService,
    private readonly audit: AuditService,
    private readonly apiKeys: ApiKeyAuthenticator,
  ) {}

  async listForUser(userId: string): Promise<TeamDto[]> {
    const memberships = await this.access.listMemberships(userId);
    return memberships.map((membership) => ({
      id: membership.teamId,
      slug: membership.teamSlug,
      name: membership.teamName,
      plan: membership.teamPlan,
      isDemo: membership.isDemo,
      developerKeysAllowed: membership.developerKeysAllowed,
      yourRole: membership.role,
    }));
  }

  /** The creator becomes the owner. */
  async create(actor: Actor, input: CreateTeamDto): Promise<TeamDto> {
    const slug = input.slug ?? slugFrom(input.name);
    try {
      const team = await this.sequelize.transaction(async (transaction) => {
        const created = await this.teams.create({ slug, name: input.name.trim(), plan: 'starter', isDemo: false }, { transaction });
        await this.memberships.create({ teamId: created.id, userId: actor.userId, role: 'owner' }, { transaction });
        await this.audit.record(
          { teamId: created.id, action: 'team.created', actor, target: { type: 'team', id: created.id }, details: { name: created.name, slug } },
          transaction,
        );
        return created;
      });
      return toDto(team, 'owner');
    } catch (error) {
      if (error instanceof UniqueConstraintError) {
        throw new ProblemException(PROBLEM_TYPES.conflict, `The slug "${slug}" is taken; choose another.`, [
          { pointer: '#/slug', detail: 'is already used by another team' },
        ]);
      }
      throw error;
    }
  }

  async get(team: TeamAccess): Promise<TeamDto> {
    return toDto(await this.load(team.teamId), team.role);
  }

  async update(team: TeamAccess, actor: Actor, input: UpdateTeamDto): Promise<TeamDto> {
    return this.sequelize.transaction(async (transaction) => {
      const row = await this.load(team.teamId);
      const changes: Record<string, { from: unknown; to: unknown }> = {};
      if (input.name !== undefined && input.name.trim() !== row.name) changes.name = { from: row.name, to: input.name.trim() };
      if (input.developerKeysAllowed !== undefined && input.developerKeysAllowed !== row.developerKeysAllowed) {
        changes.developerKeysAllowed = { from: row.developerKeysAllowed, to: input.developerKeysAllowed };
      }
      if (Object.keys(changes).length > 0) {
        await row.update(
          Object.fromEntries(Object.entries(changes).map(([field, change]) => [field, change.to])),
          { transaction },
        );
        await this.audit.record(
          { teamId: team.teamId, action: 'team.updated', actor, target: { type: 'team', id: team.teamId }, details: changes },
          transaction,
        );
      }
      return toDto(row, team.role);
    });
  }

  async changePlan(team: TeamAccess, actor: Actor, plan: TeamPlan): Promise<TeamDto> {
    const row = await this.sequelize.transaction(async (transaction) => {
      const current = await this.load(team.teamId);
      if (current.plan !== plan) {
        const from = current.plan;
        await current.update({ plan }, { transaction });
        await this.audit.record(
          { teamId: team.teamId, action: 'team.plan-changed', actor, target: { type: 'team', id: team.teamId }, details: { from, to: plan } },
          transaction,
        );
      }
      return current;
    });
    // Cached keys carry the plan: every API process drops this team's entries.
    await this.apiKeys.forgetTeam(team.teamId);
    return toDto(row, team.role);
  }

  /** Deletes the team and, by cascade, its memberships, invitations, keys and audit log. */
  async delete(team: TeamAccess): Promise<void> {
    await this.teams.destroy({ where: { id: team.teamId } });
    await this.apiKeys.forgetTeam(team.teamId);
  }

  /** The new owner must already be a member; the previous owner stays on as admin. */
  async transferOwnership(team: TeamAccess, actor: Actor, newOwnerUserId: string): Promise<void> {
    await this.sequelize.transaction(async (transaction) => {
      const rows = await this.memberships.findAll({
        where: { teamId: team.teamId, userId: [actor.userId, newOwnerUserId] },
        transaction,
        lock: transaction.LOCK.UPDATE,
      });
      const current = rows.find((row) => row.userId === actor.userId);
      const next = rows.find((row) => row.userId === newOwnerUserId);
      if (!next) {
        throw new ProblemException(PROBLEM_TYPES.notFound, `No member with user id ${newOwnerUserId} in this team.`, [
          { pointer: '#/newOwnerUserId', detail: 'is not a member of this team' },
        ]);
      }
      if (!current || current.role !== 'owner') throw new ProblemException(PROBLEM_TYPES.forbidden, 'Only the owner can transfer ownership.');
      if (next.userId === current.userId) {
        throw new ProblemException(PROBLEM_TYPES.conflict, 'You are already the owner of this team.', [
          { pointer: '#/newOwnerUserId', detail: 'is the current owner' },
        ]);
      }
      const previousRole = next.role;
      // Demote first: a partial unique index allows one owner per team at any moment.
      await current.update({ role: 'admin' }, { transaction });
      await next.update({ role: 'owner' }, { transaction });
      await this.audit.record(
        {
          teamId: team.teamId,
          action: 'team.ownership-transferred',
          actor,
          target: { type: 'user', id: next.userId },
          details: { previousOwnerUserId: current.userId, newOwnerPreviousRole: previousRole },
        },
        transaction,
      );
    });
  }

  private async load(teamId: string): Promise<Team> {
    const team = await this.teams.findByPk(teamId);
    if (!team) throw new ProblemException(PROBLEM_TYPES.notFound, `No team with id ${teamId} is visible to you.`);
    return team;
  }
}

function slugFrom(name: string): string {
  const base = name
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 50)
    .replace(/-+$/g, '');
  const suffix = randomBytes(4).toString('hex').slice(0, 6);
  return base.length >= 2 ? `${base}-${suffix}` : `team-${suffix}`;
}

function toDto(team: Team, role: TeamAccess['role']): TeamDto {
  return {
    id: team.id,
    slug: team.slug,
    name: team.name,
    plan: team.plan,
    isDemo: team.isDemo,
    developerKeysAllowed: team.developerKeysAllowed,
    yourRole: role,
  };
}
