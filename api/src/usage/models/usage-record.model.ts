import { Column, DataType, Model, Table } from 'sequelize-typescript';

@Table({ tableName: 'usage_records', underscored: true, timestamps: false })
export class UsageRecord extends Model {
  @Column({ type: DataType.BIGINT, primaryKey: true, autoIncrement: true })
  declare id: string;

  @Column({ type: DataType.UUID, allowNull: false, field: 'team_id' })
  declare teamId: string;

  @Column({ type: DataType.STRING(64), allowNull: true, field: 'api_key_id' })
  declare apiKeyId: string | null;

  @Column({ type: DataType.STRING(64), allowNull: false })
  declare endpoint: string;

  @Column({ type: DataType.BIGINT, allowNull: false })
  declare observations: string;

  @Column({ type: DataType.INTEGER, allowNull: false })
  declare units: number;

  @Column({ type: DataType.STRING(128), allowNull: false, field: 'request_id' })
  declare requestId: string;

  @Column({ type: DataType.UUID, allowNull: true, field: 'result_id' })
  declare resultId: string | null;

  @Column({ type: DataType.DATE, allowNull: false, field: 'created_at' })
  declare createdAt: Date;
}
