import { Injectable } from '@nestjs/common';
import { InjectConnection } from '@nestjs/sequelize';
import { QueryTypes } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { ProblemException } from '../problem-details/problem.exception';
import { PROBLEM_TYPES } from '../problem-details/problem-types';

/** How long a key is remembered (the draft leaves it to the server; documented in the API description). */
export const IDEMPOTENCY_RETENTION_HOURS = 24;
/** A request still "running" after this long is taken to have died with its process; a retry may take over. */
export const IDEMPOTENCY_LEASE_SECONDS = 300;

export type IdempotencyClaim =
  | { kind: 'claimed' }
  | { kind: 'replay'; status: number; body: unknown };

/**
 * Idempotency-Key (IETF draft-ietf-httpapi-idempotency-key-header): the first request with a key claims it;
 * a retry with the same key and the same request fingerprint gets the stored answer; a different
 * fingerprint is 422; a retry while the first is still running is 409.
 */
@Injectable()
export class IdempotencyService {
  constructor(@InjectConnection() private readonly sequelize: Sequelize) {}

  async claim(teamId: string, key: string, fingerprint: string): Promise<IdempotencyClaim> {
    for (let attempt = 0; attempt < 2; attempt++) {
      const inserted = await this.sequelize.query<{ team_id: string }>(
        `INSERT INTO idempotency_records (team_id, idempotency_key, request_fingerprint, state, created_at, expires_at)
         VALUES ($1, $2, $3, 'running', now(), now() + make_interval(hours => $4))
         ON CONFLICT (team_id, idempotency_key) DO NOTHING
         RETURNING team_id`,
        { bind: [teamId, key, fingerprint, IDEMPOTENCY_RETENTION_HOURS], type: QueryTypes.SELECT },
      );
      if (inserted.length > 0) return { kind: 'claimed' };
      const [existing] = await this.sequelize.query<{
        request_fingerprint: string;
        state: string;
        response_status: number | null;
        response_body: unknown;
        expired: boolean;
        abandoned: boolean;
      }>(
        `SELECT request_fingerprint, state, response_status, response_body,
                expires_at <= now() AS expired,
                state = 'running' AND created_at <= now() - make_interval(secs => $3) AS abandoned
           FROM idempotency_records WHERE team_id = $1 AND idempotency_key = $2`,
        { bind: [teamId, key, IDEMPOTENCY_LEASE_SECONDS], type: QueryTypes.SELECT },
      );
      if (!existing) continue;
      if (existing.expired || existing.abandoned) {
        await this.release(teamId, key);
        continue;
      }
      if (existing.request_fingerprint !== fingerprint) {
        throw new ProblemException(
          PROBLEM_TYPES.idempotencyKeyReused,
          'This Idempotency-Key was already used with a different request. Use a new key for a new request.',
          [{ pointer: '#/headers/idempotency-key', detail: 'reused with a different request' }],
        );
      }
      if (existing.state === 'running') {
        throw new ProblemException(
          PROBLEM_TYPES.idempotencyInProgress,
          'The first request with this Idempotency-Key is still running; retry after it finishes.',
          [],
          {},
          { 'Retry-After': '1' },
        );
      }
      return { kind: 'replay', status: existing.response_status ?? 200, body: existing.response_body };
    }
    throw new ProblemException(PROBLEM_TYPES.conflict, 'The Idempotency-Key could not be claimed; retry.');
  }

  async complete(teamId: string, key: string, status: number, body: unknown): Promise<void> {
    await this.sequelize.query(
      `UPDATE idempotency_records SET state = 'done', response_status = $3, response_body = $4::jsonb
        WHERE team_id = $1 AND idempotency_key = $2`,
      { bind: [teamId, key, status, JSON.stringify(body ?? null)] },
    );
  }

  /** Forgets a claim so that a retry runs again (the first attempt failed in a way worth retrying). */
  async release(teamId: string, key: string): Promise<void> {
    await this.sequelize.query('DELETE FROM idempotency_records WHERE team_id = $1 AND idempotency_key = $2', {
      bind: [teamId, key],
    });
  }

  /** Deletes records whose retention has ended. */
  async forgetExpired(): Promise<void> {
    await this.sequelize.query('DELETE FROM idempotency_records WHERE expires_at < now()');
  }
}
