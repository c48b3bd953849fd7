import { Injectable } from '@nestjs/common';
import { InjectConnection } from '@nestjs/sequelize';
import { Sequelize } from 'sequelize-typescript';
import { ProblemException } from '../common/problem-details/problem.exception';
import { PROBLEM_TYPES } from '../common/problem-details/problem-types';

/** A readiness probe must answer quickly even when the database hangs, so the check has its own deadline. */
const READINESS_DEADLINE_MS = 3_000;

@Injectable()
export class HealthService {
  constructor(@InjectConnection() private readonly sequelize: Sequelize) {}

  async checkDatabase(): Promise<number> {
    const started = performance.now();
    let timer: NodeJS.Timeout | undefined;
    const deadline = new Promise<never>((_, reject) => {
      timer = setTimeout(() => reject(new Error('database check timed out')), READINESS_DEADLINE_MS);
    });
    try {
      await Promise.race([this.sequelize.query('SELECT 1'), deadline]);
    } catch (error) {
      const reason = error instanceof Error ? error.message : String(error);
      throw new ProblemException(PROBLEM_TYPES.serviceUnavailable, `The database is not reachable: ${reason}`);
    } finally {
      clearTimeout(timer);
    }
    return Math.round(performance.now() - started);
  }
}
