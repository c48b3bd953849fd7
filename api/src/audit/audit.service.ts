import { Inject, Injectable } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import { InjectModel } from '@nestjs/sequelize';
import { Op, Transaction, WhereOptions } from 'sequelize';
import { decodeCursor, encodeCursor, invalidCursor, nextPageLink } from '../common/pagination/cursor';
import { appConfig } from '../config/configuration';
import { AuditAction } from './audit-actions';
import { AuditEventDto, AuditEventPageDto } from './dto/audit-event.dto';
import { ListAuditEventsQueryDto } from './dto/list-audit-events-query.dto';
import { AuditEvent } from './models/audit-event.model';

/** Who did something: a signed-in person or an API key, and from which address. */
export interface AuditActor {
  userId?: string | null;
  email?: string | null;
  keyId?: string | null;
  ipAddress?: string | null;
}

export interface AuditEntry {
  teamId: string;
  action: AuditAction;
  actor: AuditActor;
  target?: { type: string; id: string };
  details?: Record<string, unknown>;
}

const DEFAULT_PAGE_SIZE = 25;

@Injectable()
export class AuditService {
  constructor(
    @InjectModel(AuditEvent) private readonly events: typeof AuditEvent,
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
  ) {}

  /** Pass the action's transaction so the event exists exactly when the action committed. */
  async record(entry: AuditEntry, transaction?: Transaction): Promise<void> {
    await this.events.create(
      {
        teamId: entry.teamId,
        action: entry.action,
        actorUserId: entry.actor.userId ?? null,
        actorEmail: entry.actor.email ?? null,
        actorKeyId: entry.actor.keyId ?? null,
        ipAddress: entry.actor.ipAddress ?? null,
        targetType: entry.target?.type ?? null,
        targetId: entry.target?.id ?? null,
        details: entry.details ?? {},
        occurredAt: new Date(),
      },
      { transaction },
    );
  }

  async recordMany(entries: AuditEntry[], transaction?: Transaction): Promise<void> {
    for (const entry of entries) await this.record(entry, transaction);
  }

  /** Newest first. The cursor names the last id seen; ids only grow, so pages never repeat or skip. */
  async list(teamId: string, query: ListAuditEventsQueryDto, path: string): Promise<{ page: AuditEventPageDto; link?: string }> {
    const limit = query.limit ?? DEFAULT_PAGE_SIZE;
    const where: WhereOptions = { teamId };
    if (query.action) Object.assign(where, { action: query.action });
    if (query.cursor) {
      const { before } = decodeCursor(query.cursor, ['before']);
      if (!/^\d{1,18}$/.test(before ?? '')) throw invalidCursor();
      Object.assign(where, { id: { [Op.lt]: before } });
    }
    const rows = await this.events.findAll({ where, order: [['id', 'DESC']], limit: limit + 1 });
    const items = rows.slice(0, limit).map(toDto);
    const last = items[items.length - 1];
    const nextCursor = rows.length > limit && last ? encodeCursor({ before: last.id }) : null;
    const link = nextCursor
      ? nextPageLink(this.app.publicUrl, path, { limit: String(limit), action: query.action, cursor: nextCursor })
      : undefined;
    return { page: { items, nextCursor }, link };
  }
}

function toDto(event: AuditEvent): AuditEventDto {
  return {
    id: String(event.id),
    action: event.action,
    occurredAt: event.occurredAt.toISOString(),
    actor: { userId: event.actorUserId, email: event.actorEmail, apiKeyId: event.actorKeyId },
    ipAddress: event.ipAddress,
    target: event.targetType && event.targetId ? { type: event.targetType, id: event.targetId } : null,
    details: event.details,
  };
}
