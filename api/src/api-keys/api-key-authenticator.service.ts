import { Inject, Injectable } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import { InjectModel } from '@nestjs/sequelize';
import { ProblemException } from '../common/problem-details/problem.exception';
import { PROBLEM_TYPES } from '../common/problem-details/problem-types';
import { securityConfig } from '../config/configuration';
import { TeamAccessService } from '../teams/access/team-access.service';
import { ApiKeyScope } from './api-key-scopes';
import { ApiPrincipal } from './api-principal';
import { parseApiKey, secretMatches } from './key-format';
import { ApiKey } from './models/api-key.model';
import { KeyCacheInvalidation } from './key-cache-invalidation.service';
import { TtlCache } from './ttl-cache';

interface CachedKey {
  id: string;
  teamId: string;
  teamPlan: string;
  scopes: ApiKeyScope[];
  secretHash: string;
  expiresAt: number | null;
  revokedAt: number | null;
  retiresAt: number | null;
}

/** Remembers key ids with no row too, so random well-formed keys do not each cost a query. */
const UNKNOWN = 'unknown' as const;
const MAX_CACHED_KEYS = 10_000;

/**
 * Checks a presented key. Order matters: shape and checksum first (no I/O), then the cached row, then the
 * secret, and only for a caller who proved the secret do we say whether the key is revoked, expired or
 * rotated out — anyone else learns only "not valid".
 *
 * The cache holds a row for LEASTLINE_API_KEY_CACHE_TTL_MS (30 s by default). Revocation, rotation, plan
 * changes and team deletion evict the entries at once in every API process (KeyCacheInvalidation: NOTIFY /
 * LISTEN); the TTL only bounds staleness while a process's listening connection is down.
 */
@Injectable()
export class ApiKeyAuthenticator {
  private readonly cache: TtlCache<string, CachedKey | typeof UNKNOWN>;

  constructor(
    @InjectModel(ApiKey) private readonly keys: typeof ApiKey,
    private readonly teamAccess: TeamAccessService,
    @Inject(securityConfig.KEY) private readonly security: ConfigType<typeof securityConfig>,
    private readonly invalidation: KeyCacheInvalidation,
  ) {
    this.cache = new TtlCache(security.apiKeyCacheTtlMs, MAX_CACHED_KEYS);
    invalidation.onEviction((eviction) => {
      if (eviction.kind === 'key') this.cache.delete(eviction.publicId);
      else this.cache.deleteWhere((entry) => entry !== UNKNOWN && entry.teamId === eviction.teamId);
    });
  }

  async authenticate(presented: string): Promise<ApiPrincipal> {
    const parsed = parseApiKey(presented);
    if (!parsed.ok) throw new ProblemException(PROBLEM_TYPES.apiKeyMalformed, parsed.reason);
    const record = await this.lookup(parsed.keyId);
    if (record === UNKNOWN || !secretMatches(parsed.secret, this.security.keyPepper, record.secretHash)) {
      throw new ProblemException(PROBLEM_TYPES.apiKeyInvalid, 'This API key is not valid for Leastline.');
    }
    const now = Date.now();
    if (record.revokedAt !== null) {
      throw new ProblemException(
        PROBLEM_TYPES.apiKeyRevoked,
        `This API key was revoked at ${new Date(record.revokedAt).toISOString()}.`,
      );
    }
    if (record.expiresAt !== null && record.expiresAt <= now) {
      throw new ProblemException(PROBLEM_TYPES.apiKeyExpired, `This API key expired at ${new Date(record.expiresAt).toISOString()}.`);
    }
    if (record.retiresAt !== null && record.retiresAt <= now) {
      throw new ProblemException(
        PROBLEM_TYPES.apiKeyRotatedOut,
        `This API key was rotated and stopped working at ${new Date(record.retiresAt).toISOString()}; use its replacement.`,
      );
    }
    return { teamId: record.teamId, keyId: record.id, scopes: [...record.scopes], teamPlan: record.teamPlan };
  }

  /** Evicts one key (by its public key id) after revocation or rotation, in every API process. */
  forgetKey(publicId: string): Promise<void> {
    return this.invalidation.publish({ kind: 'key', publicId });
  }

  /** Evicts every key of a team after a plan change or the team's deletion, in every API process. */
  forgetTeam(teamId: string): Promise<void> {
    return this.invalidation.publish({ kind: 'team', teamId });
  }

  private async lookup(publicId: string): Promise<CachedKey | typeof UNKNOWN> {
    const cached = this.cache.get(publicId);
    if (cached !== undefined) return cached;
    const row = await this.keys.findOne({ where: { publicId } });
    const team = row ? await this.teamAccess.findTeam(row.teamId) : null;
    const record: CachedKey | typeof UNKNOWN =
      row && team
        ? {
            id: row.id,
            teamId: row.teamId,
            teamPlan: team.plan,
            scopes: row.scopes,
            secretHash: row.secretHash,
            expiresAt: row.expiresAt?.getTime() ?? null,
            revokedAt: row.revokedAt?.getTime() ?? null,
            retiresAt: row.retiresAt?.getTime() ?? null,
          }
        : UNKNOWN;
    this.cache.set(publicId, record);
    return record;
  }
}
