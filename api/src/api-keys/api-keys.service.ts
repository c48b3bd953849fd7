import { Inject, Injectable } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { Transaction, WhereOptions } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { AuditActor, AuditService } from '../audit/audit.service';
import { UsersService } from '../auth/users.service';
import { ProblemException } from '../common/problem-details/problem.exception';
import { PROBLEM_TYPES } from '../common/problem-details/problem-types';
import { TeamAccess } from '../common/request-context/request-principals';
import { securityConfig } from '../config/configuration';
import { MailOutboxService } from '../mail/mail-outbox.service';
import { apiKeyRotatedMail } from '../mail/mail-templates';
import { roleAllows } from '../teams/access/team-permissions';
import { ApiKeyAuthenticator } from './api-key-authenticator.service';
import { ApiKeyScope } from './api-key-scopes';
import { ApiKeyDto, ApiKeyStatus, CreateApiKeyDto, CreatedApiKeyDto, RotateApiKeyDto } from './dto/api-key.dto';
import { displayPrefix, generateApiKey, hashKeySecret } from './key-format';
import { ApiKey } from './models/api-key.model';

const MAX_EXPIRY_MS = 3 * 366 * 24 * 60 * 60 * 1000;
const DEFAULT_OVERLAP_HOURS = 24;

type Actor = AuditActor & { userId: string; email: string };

/**
 * Managing keys from the console. Owners and admins act on every key of the team; developers see and act
 * on the keys they created, and may create or rotate only when the team allows it (see the matrix).
 */
@Injectable()
export class ApiKeysService {
  constructor(
    @InjectModel(ApiKey) private readonly keys: typeof ApiKey,
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly authenticator: ApiKeyAuthenticator,
    private readonly audit: AuditService,
    private readonly mail: MailOutboxService,
    private readonly users: UsersService,
    @Inject(securityConfig.KEY) private readonly security: ConfigType<typeof securityConfig>,
  ) {}

  async list(team: TeamAccess, actor: Actor): Promise<ApiKeyDto[]> {
    const rows = await this.keys.findAll({ where: this.visibleTo(team, actor), order: [['createdAt', 'DESC']] });
    return rows.map(toDto);
  }

  async get(team: TeamAccess, actor: Actor, keyId: string): Promise<ApiKeyDto> {
    return toDto(await this.findVisible(team, actor, keyId));
  }

  async create(team: TeamAccess, actor: Actor, input: CreateApiKeyDto): Promise<CreatedApiKeyDto> {
    this.assertMayIssue(team);
    const expiresAt = input.expiresAt ? parseExpiry(input.expiresAt) : null;
    return this.sequelize.transaction(async (transaction) => {
      const { row, fullKey } = await this.insertKey(team.teamId, actor.userId, input.name, input.scopes, expiresAt, transaction);
      await this.audit.record(
        {
          teamId: team.teamId,
          action: 'api-key.created',
          actor,
          target: { type: 'api-key', id: row.id },
          details: { name: row.name, scopes: row.scopes, expiresAt: expiresAt?.toISOString() ?? null },
        },
        transaction,
      );
      return { apiKey: toDto(row), plaintextKey: fullKey };
    });
  }

  /**
   * Issues a replacement with the same name, scopes and expiry; the old key keeps working for the chosen
   * overlap. The key's creator (and the actor, if someone else) get a notice by e-mail.
   */
  async rotate(team: TeamAccess, actor: Actor, keyId: string, input: RotateApiKeyDto): Promise<CreatedApiKeyDto> {
    this.assertMayIssue(team);
    const overlapHours = input.overlapHours ?? DEFAULT_OVERLAP_HOURS;
    const result = await this.sequelize.transaction(async (transaction) => {
      const old = await this.findVisible(team, actor, keyId, transaction);
      const status = statusOf(old);
      if (status !== 'active') {
        throw new ProblemException(
          PROBLEM_TYPES.conflict,
          `Only an active key can be rotated; this one is ${status}.` +
            (status === 'retiring' ? ' Rotate its replacement instead.' : ''),
        );
      }
      const { row, fullKey } = await this.insertKey(team.teamId, actor.userId, old.name, old.scopes, old.expiresAt, transaction);
      const retiresAt = new Date(Date.now() + overlapHours * 60 * 60 * 1000);
      await old.update({ retiresAt, replacedByKeyId: row.id }, { transaction });
      await this.audit.record(
        {
          teamId: team.teamId,
          action: 'api-key.rotated',
          actor,
          target: { type: 'api-key', id: old.id },
          details: { name: old.name, replacedByKeyId: row.id, overlapHours, retiresAt: retiresAt.toISOString() },
        },
        transaction,
      );
      const recipients = new Set<string>([actor.email]);
      if (old.createdByUserId) {
        const creator = await this.users.findById(old.createdByUserId, transaction);
        if (creator) recipients.add(creator.email);
      }
      const notice = apiKeyRotatedMail({
        teamName: team.teamName,
        keyName: old.name,
        oldKeyPrefix: displayPrefix(old.publicId),
        newKeyPrefix: displayPrefix(row.publicId),
        rotatedBy: actor.email,
        oldKeyRetiresAt: retiresAt,
      });
      for (const recipient of recipients) await this.mail.enqueue(recipient, notice, transaction);
      return { apiKey: toDto(row), plaintextKey: fullKey, oldPublicId: old.publicId };
    });
    await this.authenticator.forgetKey(result.oldPublicId);
    return { apiKey: result.apiKey, plaintextKey: result.plaintextKey };
  }

  /** Immediate and final. Revoking an already revoked key changes nothing and records nothing. */
  async revoke(team: TeamAccess, actor: Actor, keyId: string): Promise<void> {
    const publicId = await this.sequelize.transaction(async (transaction) => {
      const key = await this.findVisible(team, actor, keyId, transaction);
      if (key.revokedAt) return key.publicId;
      await key.update({ revokedAt: new Date() }, { transaction });
      await this.audit.record(
        { teamId: team.teamId, action: 'api-key.revoked', actor, target: { type: 'api-key', id: key.id }, details: { name: key.name } },
        transaction,
      );
      return key.publicId;
    });
    await this.authenticator.forgetKey(publicId);
  }

  private async insertKey(
    teamId: string,
    createdByUserId: string,
    name: string,
    scopes: ApiKeyScope[],
    expiresAt: Date | null,
    transaction: Transaction,
  ): Promise<{ row: ApiKey; fullKey: string }> {
    const generated = generateApiKey();
    const row = await this.keys.create(
      {
        publicId: generated.keyId,
        teamId,
        name,
        scopes,
        secretHash: hashKeySecret(generated.secret, this.security.keyPepper),
        createdByUserId,
        expiresAt,
      },
      { transaction },
    );
    return { row, fullKey: generated.fullKey };
  }

  private assertMayIssue(team: TeamAccess): void {
    if (!roleAllows(team.role, 'keys:manage-all') && !team.developerKeysAllowed) {
      throw new ProblemException(
        PROBLEM_TYPES.forbidden,
        'The admins of this team have not allowed developers to create or rotate their own keys; ask an owner or admin.',
        [],
        { requiredPermission: 'keys:manage-all', yourRole: team.role },
      );
    }
  }

  private visibleTo(team: TeamAccess, actor: Actor): WhereOptions {
    return roleAllows(team.role, 'keys:manage-all')
      ? { teamId: team.teamId }
      : { teamId: team.teamId, createdByUserId: actor.userId };
  }

  private async findVisible(team: TeamAccess, actor: Actor, keyId: string, transaction?: Transaction): Promise<ApiKey> {
    const key = await this.keys.findOne({
      where: { ...this.visibleTo(team, actor), id: keyId },
      transaction,
      lock: transaction ? transaction.LOCK.UPDATE : undefined,
    });
    if (!key) throw new ProblemException(PROBLEM_TYPES.notFound, `No API key with id ${keyId} is visible to you in this team.`);
    return key;
  }
}

function parseExpiry(value: string): Date {
  const expiresAt = new Date(value);
  const now = Date.now();
  if (expiresAt.getTime() <= now || expiresAt.getTime() > now + MAX_EXPIRY_MS) {
    throw new ProblemException(PROBLEM_TYPES.invalidRequest, 'expiresAt must lie in the future and at most 3 years ahead.', [
      { pointer: '#/expiresAt', detail: 'must be in the future and at most 3 years ahead' },
    ]);
  }
  return expiresAt;
}

export function statusOf(key: ApiKey, now = Date.now()): ApiKeyStatus {
  if (key.revokedAt) return 'revoked';
  if (key.expiresAt && key.expiresAt.getTime() <= now) return 'expired';
  if (key.retiresAt) return key.retiresAt.getTime() <= now ? 'rotated-out' : 'retiring';
  return 'active';
}

function iso(value: Date | null): string | null {
  return value ? value.toISOString() : null;
}

function toDto(key: ApiKey): ApiKeyDto {
  return {
    id: key.id,
    name: key.name,
    prefix: displayPrefix(key.publicId),
    scopes: key.scopes,
    status: statusOf(key),
    createdByUserId: key.createdByUserId,
    createdAt: key.createdAt.toISOString(),
    expiresAt: iso(key.expiresAt),
    lastUsedAt: iso(key.lastUsedAt),
    lastUsedIp: key.lastUsedIp,
    revokedAt: iso(key.revokedAt),
    retiresAt: iso(key.retiresAt),
    replacedByKeyId: key.replacedByKeyId,
  };
}
