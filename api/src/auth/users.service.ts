import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Transaction } from 'sequelize';
import { normalizeEmail } from './email-address';
import { User } from './models/user.model';

export interface UserSummary {
  id: string;
  email: string;
  displayName: string;
}

@Injectable()
export class UsersService {
  constructor(@InjectModel(User) private readonly users: typeof User) {}

  findByEmail(email: string, transaction?: Transaction): Promise<User | null> {
    return this.users.findOne({ where: { email: normalizeEmail(email) }, transaction });
  }

  findById(id: string, transaction?: Transaction): Promise<User | null> {
    return this.users.findByPk(id, { transaction });
  }

  async summariesByIds(ids: string[]): Promise<Map<string, UserSummary>> {
    if (ids.length === 0) return new Map();
    const rows = await this.users.findAll({ where: { id: [...new Set(ids)] } });
    return new Map(rows.map((user) => [user.id, summarise(user)]));
  }

  async create(input: { email: string; displayName: string; passwordHash: string }, transaction?: Transaction): Promise<User> {
    return this.users.create(
      { email: normalizeEmail(input.email), displayName: input.displayName.trim(), passwordHash: input.passwordHash },
      { transaction },
    );
  }

  async setPasswordHash(userId: string, passwordHash: string, transaction?: Transaction): Promise<void> {
    await this.users.update({ passwordHash, passwordChangedAt: new Date() }, { where: { id: userId }, transaction });
  }
}

export function summarise(user: User): UserSummary {
  return { id: user.id, email: user.email, displayName: user.displayName };
}
