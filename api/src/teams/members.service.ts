import { Injectable } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { Transaction } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { AuditActor, AuditService } from '../audit/audit.service';
import { UsersService } from '../auth/users.service';
import { ProblemException } from '../common/problem-details/problem.exception';
import { PROBLEM_TYPES } from '../common/problem-details/problem-types';
import { TeamAccess } from '../common/request-context/request-principals';
import { AssignableRole } from './access/team-permissions';
import { MemberDto } from './dto/member.dto';
import { Membership } from './models/membership.model';

type Actor = AuditActor & { userId: string; email: string };

@Injectable()
export class MembersService {
  constructor(
    @InjectModel(Membership) private readonly memberships: typeof Membership,
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly users: UsersService,
    private readonly audit: AuditService,
  ) {}

  async list(team: TeamAccess): Promise<MemberDto[]> {
    const rows = await this.memberships.findAll({ where: { teamId: team.teamId }, order: [['createdAt', 'ASC']] });
    const people = await this.users.summariesByIds(rows.map((row) => row.userId));
    return rows.flatMap((row) => {
      const person = people.get(row.userId);
      return person
        ? [{ userId: row.userId, email: person.email, displayName: person.displayName, role: row.role, joinedAt: row.createdAt.toISOString() }]
        : [];
    });
  }

  async changeRole(team: TeamAccess, actor: Actor, userId: string, role: AssignableRole): Promise<MemberDto> {
    await this.sequelize.transaction(async (transaction) => {
      const membership = await this.findMember(team.teamId, userId, transaction);
      if (membership.role === 'owner') {
        throw new ProblemException(PROBLEM_TYPES.forbidden, "The owner's role changes only by transferring ownership.");
      }
      if (membership.role === role) return;
      const from = membership.role;
      await membership.update({ role }, { transaction });
      await this.audit.record(
        { teamId: team.teamId, action: 'member.role-changed', actor, target: { type: 'user', id: userId }, details: { from, to: role } },
        transaction,
      );
    });
    const member = (await this.list(team)).find((entry) => entry.userId === userId);
    if (!member) throw new ProblemException(PROBLEM_TYPES.notFound, `No member with user id ${userId} in this team.`);
    return member;
  }

  async remove(team: TeamAccess, actor: Actor, userId: string): Promise<void> {
    await this.sequelize.transaction(async (transaction) => {
      const membership = await this.findMember(team.teamId, userId, transaction);
      if (membership.role === 'owner') {
        throw new ProblemException(PROBLEM_TYPES.forbidden, 'The owner cannot be removed; transfer ownership first.');
      }
      await membership.destroy({ transaction });
      await this.audit.record(
        { teamId: team.teamId, action: 'member.removed', actor, target: { type: 'user', id: userId }, details: { role: membership.role } },
        transaction,
      );
    });
  }

  private async findMember(teamId: string, userId: string, transaction: Transaction): Promise<Membership> {
    const membership = await this.memberships.findOne({ where: { teamId, userId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!membership) throw new ProblemException(PROBLEM_TYPES.notFound, `No member with user id ${userId} in this team.`);
    return membership;
  }
}
