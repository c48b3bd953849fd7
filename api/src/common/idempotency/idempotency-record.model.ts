import { Column, DataType, Model, Table } from 'sequelize-typescript';

@Table({ tableName: 'idempotency_records', underscored: true, timestamps: false })
export class IdempotencyRecord extends Model {
  @Column({ type: DataType.UUID, primaryKey: true, field: 'team_id' })
  declare teamId: string;

  @Column({ type: DataType.STRING(255), primaryKey: true, field: 'idempotency_key' })
  declare idempotencyKey: string;

  @Column({ type: DataType.STRING(64), allowNull: false, field: 'request_fingerprint' })
  declare requestFingerprint: string;

  @Column({ type: DataType.STRING(16), allowNull: false })
  declare state: 'running' | 'done';

  @Column({ type: DataType.INTEGER, allowNull: true, field: 'response_status' })
  declare responseStatus: number | null;

  @Column({ type: DataType.JSONB, allowNull: true, field: 'response_body' })
  declare responseBody: unknown;

  @Column({ type: DataType.DATE, allowNull: false, field: 'created_at' })
  declare createdAt: Date;

  @Column({ type: DataType.DATE, allowNull: false, field: 'expires_at' })
  declare expiresAt: Date;
}
