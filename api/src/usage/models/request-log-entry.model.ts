import { Column, DataType, Model, Table } from 'sequelize-typescript';

@Table({ tableName: 'request_log', underscored: true, timestamps: false })
export class RequestLogEntry extends Model {
  @Column({ type: DataType.BIGINT, primaryKey: true, autoIncrement: true })
  declare id: string;

  @Column({ type: DataType.UUID, allowNull: false, field: 'team_id' })
  declare teamId: string;

  @Column({ type: DataType.STRING(64), allowNull: true, field: 'api_key_id' })
  declare apiKeyId: string | null;

  @Column({ type: DataType.STRING(8), allowNull: false })
  declare method: string;

  @Column({ type: DataType.STRING(128), allowNull: false })
  declare route: string;

  @Column({ type: DataType.INTEGER, allowNull: false })
  declare status: number;

  @Column({ type: DataType.DOUBLE, allowNull: false, field: 'duration_ms' })
  declare durationMs: number;

  @Column({ type: DataType.STRING(128), allowNull: false, field: 'request_id' })
  declare requestId: string;

  @Column({ type: DataType.DATE, allowNull: false, field: 'created_at' })
  declare createdAt: Date;
}
