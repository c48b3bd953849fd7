import { ModelCtor } from 'sequelize-typescript';
import { ApiKey } from '../api-keys/models/api-key.model';
import { AuditEvent } from '../audit/models/audit-event.model';
import { PasswordReset } from '../auth/models/password-reset.model';
import { Session } from '../auth/models/session.model';
import { SignInThrottle } from '../auth/models/sign-in-throttle.model';
import { User } from '../auth/models/user.model';
import { OutboxMessage } from '../mail/models/outbox-message.model';
import { Invitation } from '../teams/models/invitation.model';
import { Membership } from '../teams/models/membership.model';
import { Team } from '../teams/models/team.model';
import { IdempotencyRecord } from '../common/idempotency/idempotency-record.model';
import { Dataset } from '../datasets/models/dataset.model';
import { StoredResult } from '../regression/models/stored-result.model';
import { RequestLogEntry } from '../usage/models/request-log-entry.model';
import { UsageRecord } from '../usage/models/usage-record.model';

/**
 * Every Sequelize model, registered on the one connection. Features still reach other features' data only
 * through the exported services; this list exists because models are registered explicitly (see
 * DatabaseModule for why automatic loading stays off).
 */
export const ALL_MODELS: ModelCtor[] = [
  Team,
  User,
  Session,
  SignInThrottle,
  PasswordReset,
  Membership,
  Invitation,
  ApiKey,
  AuditEvent,
  OutboxMessage,
  Dataset,
  StoredResult,
  UsageRecord,
  RequestLogEntry,
  IdempotencyRecord,
];
