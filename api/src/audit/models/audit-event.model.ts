import { Column, DataType, Model, Table } from 'sequelize-typescript';

@Table({ tableName: 'audit_events', underscored: true, timestamps: false })
export class AuditEvent extends Model {
  // BIGINT arrives from pg as a string; kept as a string so no id above 2^53 is ever rounded.
  @Column({ type: DataType.BIGINT, primaryKey: true, autoIncrement: true })
  declare id: string;

  @Column({ type: DataType.UUID, allowNull: false, field: 'team_id' })
  declare teamId: string;

  @Column({ type: DataType.STRING(64), allowNull: false })
  declare action: string;

  @Column({ type: DataType.UUID, allowNull: true, field: 'actor_user_id' })
  declare actorUserId: string | null;

  @Column({ type: DataType.STRING(320), allowNull: true, field: 'actor_email' })
  declare actorEmail: string | null;

  @Column({ type: DataType.UUID, allowNull: true, field: 'actor_key_id' })
  declare actorKeyId: string | null;

  @Column({ type: DataType.STRING(32), allowNull: true, field: 'target_type' })
  declare targetType: string | null;

  @Column({ type: DataType.STRING(64), allowNull: true, field: 'target_id' })
  declare targetId: string | null;

  @Column({ type: DataType.JSONB, allowNull: false, defaultValue: {} })
  declare details: Record<string, unknown>;

  @Column({ type: DataType.STRING(64), allowNull: true, field: 'ip_address' })
  declare ipAddress: string | null;

  @Column({ type: DataType.DATE, allowNull: false, field: 'occurred_at', defaultValue: DataType.NOW })
  declare occurredAt: Date;
}
