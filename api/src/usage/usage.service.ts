import { Injectable } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { QueryTypes, Transaction } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { billableUnits, BillableWork } from './billable-units';
import { RequestLogEntry } from './models/request-log-entry.model';
import { UsageRecord } from './models/usage-record.model';

export interface MeteredCall extends BillableWork {
  teamId: string;
  apiKeyId: string | null;
  endpoint: string;
  requestId: string;
  resultId: string | null;
}

export interface LoggedRequest {
  teamId: string;
  apiKeyId: string | null;
  method: string;
  route: string;
  status: number;
  durationMs: number;
  requestId: string;
}

export interface UsageRow {
  day: string;
  apiKeyId: string | null;
  endpoint: string;
  requests: number;
  units: number;
  observations: number;
}

/**
 * Metering. `record` must be called inside the transaction that stores the call's result, so a result
 * exists exactly when its usage row does; the unique request id makes a second write for the same
 * request fail instead of double-billing.
 */
@Injectable()
export class UsageService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(UsageRecord) private readonly usageRecords: typeof UsageRecord,
    @InjectModel(RequestLogEntry) private readonly requestLog: typeof RequestLogEntry,
  ) {}

  async record(call: MeteredCall, transaction: Transaction): Promise<UsageRecord> {
    return this.usageRecords.create(
      {
        teamId: call.teamId,
        apiKeyId: call.apiKeyId,
        endpoint: call.endpoint,
        observations: String(call.observations),
        units: billableUnits(call),
        requestId: call.requestId,
        resultId: call.resultId,
        createdAt: new Date(),
      },
      { transaction },
    );
  }

  /** Usage by UTC day, key and endpoint for [from, to) (dates as YYYY-MM-DD). */
  async summary(teamId: string, from: string, to: string): Promise<UsageRow[]> {
    const rows = await this.sequelize.query<{
      day: string;
      api_key_id: string | null;
      endpoint: string;
      requests: string;
      units: string;
      observations: string;
    }>(
      `SELECT to_char(date_trunc('day', created_at AT TIME ZONE 'UTC'), 'YYYY-MM-DD') AS day,
              api_key_id, endpoint, COUNT(*) AS requests, SUM(units) AS units, SUM(observations) AS observations
         FROM usage_records
        WHERE team_id = $1 AND created_at >= ($2::date AT TIME ZONE 'UTC') AND created_at < ($3::date AT TIME ZONE 'UTC')
        GROUP BY 1, 2, 3 ORDER BY 1, 3, 2`,
      { bind: [teamId, from, to], type: QueryTypes.SELECT },
    );
    return rows.map((row) => ({
      day: row.day,
      apiKeyId: row.api_key_id,
      endpoint: row.endpoint,
      requests: Number(row.requests),
      units: Number(row.units),
      observations: Number(row.observations),
    }));
  }

  /** Units used in the current calendar month (UTC), for allowance displays. */
  async unitsThisMonth(teamId: string): Promise<number> {
    const [row] = await this.sequelize.query<{ units: string | null }>(
      `SELECT SUM(units) AS units FROM usage_records
        WHERE team_id = $1 AND created_at >= date_trunc('month', now() AT TIME ZONE 'UTC') AT TIME ZONE 'UTC'`,
      { bind: [teamId], type: QueryTypes.SELECT },
    );
    return Number(row?.units ?? 0);
  }

  /** One line per public API request, whatever its outcome (the console's overview reads these). */
  async logRequest(entry: LoggedRequest): Promise<void> {
    await this.requestLog.create({ ...entry, createdAt: new Date() });
  }

  async recentRequests(teamId: string, limit: number): Promise<RequestLogEntry[]> {
    return this.requestLog.findAll({ where: { teamId }, order: [['createdAt', 'DESC']], limit });
  }

  /** Requests and errors (status ≥ 400) by UTC day for the last `days` days. */
  async requestsByDay(teamId: string, days: number) {
    const rows = await this.sequelize.query<{ day: string; requests: string; errors: string }>(
      `SELECT to_char(date_trunc('day', created_at AT TIME ZONE 'UTC'), 'YYYY-MM-DD') AS day,
              COUNT(*) AS requests, COUNT(*) FILTER (WHERE status >= 400) AS errors
         FROM request_log
        WHERE team_id = $1 AND created_at >= now() - make_interval(days => $2)
        GROUP BY 1 ORDER BY 1`,
      { bind: [teamId, days], type: QueryTypes.SELECT },
    );
    return rows.map((row) => ({ day: row.day, requests: Number(row.requests), errors: Number(row.errors) }));
  }

  async forgetOldRequests(days: number): Promise<void> {
    await this.sequelize.query('DELETE FROM request_log WHERE created_at < now() - make_interval(days => $1)', { bind: [days] });
  }
}
